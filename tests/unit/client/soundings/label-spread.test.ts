import { describe, expect, it } from "vitest";
import { spreadUpward } from "../../../../src/features/soundings/chart/label-spread.ts";

describe("spreadUpward", () => {
  it("leaves labels that are far enough apart where they are", () => {
    expect(spreadUpward([500, 300, 100], 12)).toEqual([500, 300, 100]);
  });

  it("pushes a crowded label up by the gap, keeping the input order", () => {
    // LCL at y = 500 and LFC at y = 495: the upper one moves to 488.
    expect(spreadUpward([500, 495, 100], 12)).toEqual([500, 488, 100]);
    expect(spreadUpward([495, 500], 12)).toEqual([488, 500]);
  });

  it("cascades when a push reaches the next label", () => {
    expect(spreadUpward([500, 495, 480], 12)).toEqual([500, 488, 476]);
  });
});
