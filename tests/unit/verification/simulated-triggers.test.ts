import { describe, expect, it } from "vitest";
import { simulatedTriggers, type BacktestView } from "../../../server/verification/simulated-triggers.ts";
import { simulatedOpening } from "../../../server/verification/compare-versions.ts";

const frame = (id: number, hour: number) => ({ id, runTime: "2026-05-14T12:00:00.000Z", validTime: `2026-05-14T${String(hour).padStart(2, "0")}:00:00.000Z` });

describe("triggers rebuilt from a backtest", () => {
  it("follows each zone's openings and extensions, and starts again after a new opening", () => {
    // Hand-built decisions as the live engine would take them: zone 1 opens at 18Z (persistence
    // reached back to 17Z), extends at 19Z, is cleared at 20Z and opens again at 22Z; zone 2 only opens at 19Z.
    const backtest: BacktestView = {
      frames: [
        { frame: frame(1, 17), zones: [{ zoneId: 1, met: true, decision: "none" }, { zoneId: 2, met: false, decision: "none" }] },
        { frame: frame(2, 18), zones: [{ zoneId: 1, met: true, decision: "open" }, { zoneId: 2, met: false, decision: "none" }] },
        { frame: frame(3, 19), zones: [{ zoneId: 1, met: true, decision: "extend" }, { zoneId: 2, met: true, decision: "open" }] },
        { frame: frame(4, 20), zones: [{ zoneId: 1, met: false, decision: "retract" }, { zoneId: 2, met: false, decision: "retract" }] },
        { frame: frame(5, 22), zones: [{ zoneId: 1, met: true, decision: "open" }, { zoneId: 2, met: false, decision: "none" }] },
      ],
      opened: [
        { zoneId: 1, firstValidTime: "2026-05-14T17:00:00.000Z", runTime: "2026-05-14T12:00:00.000Z" },
        { zoneId: 2, firstValidTime: "2026-05-14T19:00:00.000Z", runTime: "2026-05-14T12:00:00.000Z" },
        { zoneId: 1, firstValidTime: "2026-05-14T22:00:00.000Z", runTime: "2026-05-14T12:00:00.000Z" },
      ],
    };
    expect(simulatedTriggers(backtest)).toEqual([
      { zoneId: 1, openingFrameId: 2, firstValidTime: "2026-05-14T17:00:00.000Z", lastValidTime: "2026-05-14T19:00:00.000Z", frameIds: [2, 3] },
      { zoneId: 2, openingFrameId: 3, firstValidTime: "2026-05-14T19:00:00.000Z", lastValidTime: "2026-05-14T19:00:00.000Z", frameIds: [3] },
      { zoneId: 1, openingFrameId: 5, firstValidTime: "2026-05-14T22:00:00.000Z", lastValidTime: "2026-05-14T22:00:00.000Z", frameIds: [5] },
    ]);
  });

  it("opens when the frame arrived, or at the run time for a run loaded after the fact", () => {
    expect(simulatedOpening({ runTime: "2026-05-14T12:00:00.000Z", createdAt: "2026-05-14T13:10:00.000Z" }, "x")).toBe("2026-05-14T13:10:00.000Z");
    expect(simulatedOpening({ runTime: "2026-05-14T12:00:00.000Z", createdAt: "2026-06-01T08:00:00.000Z" }, "x")).toBe("2026-05-14T12:00:00.000Z");
    expect(simulatedOpening(undefined, "fallback")).toBe("fallback");
  });
});
