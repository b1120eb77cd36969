import { describe, expect, it } from "vitest";
import { gridGeometryDto } from "../../../../shared/api/grids.ts";
import type { GridGeometry } from "../../../../shared/grid/geometry-types.ts";
import { demoGeometry } from "../../../../server/demo/demo-domain.ts";
import { formatFileSize, formatForecastHour } from "../../../../src/features/grids/format-grid-labels.ts";
import { formatLatLon } from "../../../../src/components/map/format-lat-lon.ts";
import { neighbourFrames } from "../../../../src/features/grids/components/map/frame-stepper.tsx";
import { frameStepForKey } from "../../../../src/features/grids/hooks/use-frame-step-keys.ts";
import { formatUtcCycle } from "../../../../src/lib/time.ts";
import { gridFramePath } from "../../../../src/config/paths.ts";

describe("labels", () => {
  it("writes runs and forecast hours the way staff say them", () => {
    expect(formatUtcCycle("2026-05-14T12:00:00Z")).toBe("2026-05-14 12Z"); // Common practice (no source): "12Z" for the 12 UTC run
    expect(formatUtcCycle("2026-05-14T12:30:00Z")).toBe("2026-05-14 12:30Z");
    expect(formatForecastHour(3)).toBe("F03"); // Common practice (no source): F + two-digit forecast hour
    expect(formatForecastHour(120)).toBe("F120");
    expect(formatForecastHour(1.5)).toBe("F01:30");
  });

  it("writes positions with hemispheres and sizes in binary multiples", () => {
    expect(formatLatLon(35.123, -97.804)).toBe("35.12° N, 97.80° W");
    expect(formatLatLon(-33.9, 151.2)).toBe("33.90° S, 151.20° E");
    expect(formatFileSize(812)).toBe("812 B");
    expect(formatFileSize(1.4 * 1024 * 1024)).toBe("1.4 MB"); // Derived in closed form: 1 MB = 1024² bytes here
  });

  it("links to a frame's map keeping the viewer settings", () => {
    expect(gridFramePath(7)).toBe("/grids/frames/7");
    expect(gridFramePath(7, "field=mlcape")).toBe("/grids/frames/7?field=mlcape");
    expect(gridFramePath(7, "?field=mlcape")).toBe("/grids/frames/7?field=mlcape");
  });
});

describe("frame stepping", () => {
  const frame = (id: number, hour: number) => ({ id, runId: 1, model: "m", runTime: "2026-05-14T12:00:00.000Z", validTime: new Date(Date.UTC(2026, 4, 14, 12 + hour)).toISOString(), forecastHour: hour, ingestJobId: 1 });

  it("finds the previous and next valid time whatever order the frames come in", () => {
    const frames = [frame(30, 3), frame(10, 1), frame(20, 2)];
    expect(neighbourFrames(frames, 20)).toMatchObject({ previous: { id: 10 }, next: { id: 30 }, index: 1 });
    expect(neighbourFrames(frames, 10)).toMatchObject({ previous: null, next: { id: 20 } });
    expect(neighbourFrames(frames, 99)).toMatchObject({ previous: null, next: null, index: -1 });
  });

  it("steps with [ ] and the left and right arrows only", () => {
    expect(["[", "ArrowLeft", "]", "ArrowRight", "ArrowUp", "a"].map(frameStepForKey)).toEqual([-1, -1, 1, 1, 0, 0]);
  });
});

describe("the grid geometry schema", () => {
  it("accepts the geometry the server stores and refuses a broken one", () => {
    const parsed: GridGeometry = gridGeometryDto.parse(JSON.parse(JSON.stringify(demoGeometry())));
    expect(parsed).toEqual(demoGeometry());
    expect(gridGeometryDto.safeParse({ ...demoGeometry(), dx: -1 }).success).toBe(false);
    expect(gridGeometryDto.safeParse({ ...demoGeometry(), kind: "mercator" }).success).toBe(false);
  });
});
