import { describe, expect, it } from "vitest";
import type { IngestJobDto } from "../../../../shared/api/grids.ts";
import { withJobProgress } from "../../../../src/features/grids/hooks/use-grid-live-updates.ts";
import { decodeFieldBytes } from "../../../../src/components/map/field-values.ts";

const job = (id: number, state: IngestJobDto["state"], progress = 0): IngestJobDto => ({
  id,
  source: "inbox",
  originalName: `f${id}.grib2`,
  sizeBytes: 10,
  format: "grib2",
  sha256: "x",
  state,
  progress,
  stageNote: null,
  failureReason: null,
  ignoredFields: [],
  submittedBy: null,
  createdAt: "2026-05-14T12:00:00.000Z",
  startedAt: null,
  finishedAt: null,
  frameCount: 0,
});

describe("progress events on the cached job list", () => {
  it("updates the job the event names and leaves the others alone", () => {
    const jobs = [job(2, "queued"), job(1, "decoding", 0.1)];
    const next = withJobProgress(jobs, { jobId: 1, state: "diagnosing", progress: 0.5, note: "Diagnosing frame 1 of 1" })!;
    expect(next[1]).toMatchObject({ id: 1, state: "diagnosing", progress: 0.5, stageNote: "Diagnosing frame 1 of 1" });
    expect(next[0]).toBe(jobs[0]);
    expect(jobs[1]!.state).toBe("decoding");
  });

  it("asks for a refetch when the job is not listed yet", () => {
    expect(withJobProgress([job(1, "queued")], { jobId: 5, state: "decoding", progress: 0.02, note: null })).toBeNull();
  });

  it("never pulls a finished job back to running", () => {
    const next = withJobProgress([job(1, "ready", 1)], { jobId: 1, state: "diagnosing", progress: 0.9, note: "late" })!;
    expect(next[0]).toMatchObject({ state: "ready", progress: 1 });
  });
});

describe("field bytes", () => {
  const headers = (nx: number, ny: number) => new Headers({ "x-grid-nx": String(nx), "x-grid-ny": String(ny) });

  it("reads little-endian Float32 values in the canonical order, NaN included", () => {
    const bytes = new ArrayBuffer(4 * 4);
    const view = new DataView(bytes);
    [1.5, -2, Number.NaN, 1000].forEach((value, k) => view.setFloat32(k * 4, value, true));
    const field = decodeFieldBytes(bytes, headers(2, 2), { nx: 2, ny: 2 });
    expect([...field.values]).toEqual([1.5, -2, Number.NaN, 1000]);
  });

  it("refuses a reply whose size does not match the frame's grid", () => {
    expect(() => decodeFieldBytes(new ArrayBuffer(16), headers(2, 2), { nx: 4, ny: 1 })).toThrow(/2 × 2 points but the frame's grid is 4 × 1/);
    expect(() => decodeFieldBytes(new ArrayBuffer(12), headers(2, 2), { nx: 2, ny: 2 })).toThrow(/12 bytes; 2 × 2 Float32 values need 16/);
    expect(() => decodeFieldBytes(new ArrayBuffer(16), new Headers(), { nx: 2, ny: 2 })).toThrow(/x-grid-nx/);
  });
});
