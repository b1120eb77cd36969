/**
 * Prints which demo rule holds in which demo zone, frame by frame, for tuning the invented demo
 * atmosphere: `npx tsx scripts/demo-story.ts`. One column block per rule, one character per zone.
 */
import { demoZones } from "../server/demo/demo-zones.ts";
import { demoRules } from "../server/demo/demo-rules.ts";
import { demoGribFile } from "../server/demo/demo-run.ts";
import { decodeGridFile } from "../server/ingest/decode-file.ts";
import { assembleFrames } from "../server/ingest/assemble-frames.ts";
import { frameExtraDiagnosers } from "../server/ingest/frame-diagnostics.ts";
import { allocateColumnGridOutput } from "../shared/meteo/column/column-grid.ts";
import { diagnoseColumnGrid } from "../shared/meteo/column/diagnose-grid.ts";
import { compileRule, parseRuleOrThrow, summariseMatches, evaluateSpatialCondition } from "../shared/rules/index.ts";
import { zoneMask } from "../shared/zones/zone-geometry.ts";
import { gridCoordinates } from "../shared/grid/grid-coordinates.ts";
const zones = demoZones();
const rules = demoRules(zones.map((_, i) => i));
const run = { runTime: new Date("2026-05-14T12:00:00Z"), forecastHours: [1,2,3,4,5,6,7,8,9] };
for (const h of run.forecastHours) {
  const { frames } = assembleFrames(await decodeGridFile(demoGribFile(run, h), "grib2"));
  const frame = frames[0]!; const n = frame.grid.pointCount;
  const f: any = allocateColumnGridOutput(n); diagnoseColumnGrid(frame.grid, f);
  Object.assign(f, (await frameExtraDiagnosers()[0]!(frame)).fields);
  const { lat, lon } = gridCoordinates(frame.geometry);
  const masks = zones.map((z) => zoneMask(z.geometry, lat, lon));
  const line = rules.map((r) => { const c = compileRule(parseRuleOrThrow(r.expression)); const met = c.evaluate((k) => f[k], n); const nm = c.evaluateNotMet((k) => f[k], n);
    return masks.map((m) => evaluateSpatialCondition(r.spatialCondition, summariseMatches({ met, notMet: nm, zone: m, fields: (k) => f[k], summaryKeys: [] })).met ? "X" : ".").join(""); });
  console.log(`f${h}`, line.join("  "));
}
console.log("rules:", rules.map((r) => r.name).join(" | "));
