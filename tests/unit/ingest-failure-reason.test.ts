import { describe, expect, it } from "vitest";
import { ingestFailureReason } from "../../server/ingest/failure-reason.ts";
import { FrameAssemblyError } from "../../server/ingest/assemble-frames.ts";

describe("the reason shown on a failed ingest job", () => {
  it("keeps the words of an error that describes the file", () => {
    expect(ingestFailureReason(new FrameAssemblyError("Missing required fields for 18Z: surface pressure."))).toBe("Missing required fields for 18Z: surface pressure.");
  });

  it("says plainly when the fault is Bellwether's own", () => {
    const reason = ingestFailureReason(new TypeError("Cannot read properties of undefined (reading 'length')"));
    expect(reason).toMatch(/^Bellwether could not process this file because of an internal error/);
    expect(reason).toContain("reading 'length'");
  });
});
