import { describe, expect, it } from "vitest";
import { demoGribFile } from "../../server/demo/demo-run.ts";
import { decodeGridFile } from "../../server/ingest/decode-file.ts";
import { assembleFrames } from "../../server/ingest/assemble-frames.ts";
import { frameExtraDiagnosers } from "../../server/ingest/frame-diagnostics.ts";
import { fieldsAtPoint } from "../../server/cli/commands/fields.command.ts";
import { gridCoordinates } from "../../shared/grid/grid-coordinates.ts";
import { QUADRANT } from "../../shared/meteo/jet/index.ts";

/**
 * The invented demo run's jet streak, end to end: GRIB2 file → decoder → frame → jet diagnostics,
 * and the `fields --at` path at one point chosen in each quadrant.
 */
const run = { runTime: new Date("2026-05-14T12:00:00Z"), forecastHours: [1, 2, 3, 4, 5, 6, 7, 8, 9] };
const bytes = demoGribFile(run, 7);

describe("the demo jet streak", async () => {
  const { frames } = assembleFrames(await decodeGridFile(bytes, "grib2"));
  const result = await frameExtraDiagnosers()[0]!(frames[0]!);
  const quadrant = result.fields.jet_quadrant!;
  const divergence = result.fields.jet_div!;
  const meanDivergence = (code: number) => {
    let sum = 0;
    let count = 0;
    for (let i = 0; i < quadrant.length; i++) if (quadrant[i] === code && !Number.isNaN(divergence[i]!)) (sum += divergence[i]!), count++;
    return sum / count;
  };

  it("is found as one streak on the warm-season jet level", () => {
    const doc = result.documents!["jet-streaks"] as { jetLevelPressure: number; streaks: Array<{ core: { speed: number } }> };
    expect(doc.jetLevelPressure).toBe(25000);
    expect(doc.streaks).toHaveLength(1);
    expect(doc.streaks[0]!.core.speed).toBeGreaterThan(50);
  });

  it("has the straight-streak divergence pattern in the Northern Hemisphere", () => {
    // Source: four-quadrant model of a straight jet streak (Bluestein 1993, Vol. II; Uccellini and Kocin 1987):
    // divergence in the left exit and right entrance, convergence in the left entrance and right exit.
    expect(meanDivergence(QUADRANT.leftExit)).toBeGreaterThan(0);
    expect(meanDivergence(QUADRANT.rightEntrance)).toBeGreaterThan(0);
    expect(meanDivergence(QUADRANT.leftEntrance)).toBeLessThan(0);
    expect(meanDivergence(QUADRANT.rightExit)).toBeLessThan(0);
  });

  it("reports each quadrant through `fields --at` at a point chosen inside it", async () => {
    const { lat, lon } = gridCoordinates(frames[0]!.geometry);
    for (const code of [QUADRANT.leftEntrance, QUADRANT.rightEntrance, QUADRANT.leftExit, QUADRANT.rightExit]) {
      const points = [];
      for (let i = 0; i < quadrant.length; i++) if (quadrant[i] === code) points.push(i);
      const chosen = points[Math.floor(points.length / 2)]!;
      const [frame] = await fieldsAtPoint(bytes, { lat: lat[chosen]!, lon: lon[chosen]! }, null);
      expect(frame!.fields.jet_quadrant, `quadrant ${code}`).toBe(code);
      expect(frame!.fields.jet_left_exit).toBe(code === QUADRANT.leftExit ? 1 : 0);
      expect(frame!.fields.jet_right_entrance).toBe(code === QUADRANT.rightEntrance ? 1 : 0);
    }
  });
});
