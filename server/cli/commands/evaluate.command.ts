import fs from "node:fs";
import { importZonesInput } from "../../../shared/api/zones.ts";
import { gridCoordinates } from "../../../shared/grid/grid-coordinates.ts";
import { zoneMask } from "../../../shared/zones/zone-geometry.ts";
import { allocateColumnGridOutput } from "../../../shared/meteo/column/column-grid.ts";
import { diagnoseColumnGrid } from "../../../shared/meteo/column/diagnose-grid.ts";
import { compileRule, evaluateSpatialCondition, parseRule, summariseMatches, type SpatialCondition } from "../../../shared/rules/index.ts";
import type { FieldKey } from "../../../shared/fields.ts";
import { readGridFile } from "../read-grid-file.ts";
import { decodeGridFile } from "../../ingest/decode-file.ts";
import { assembleFrames } from "../../ingest/assemble-frames.ts";
import { frameExtraDiagnosers } from "../../ingest/frame-diagnostics.ts";
import { CliUsageError, parseCliArgs, type CliCommand } from "../command.ts";

interface CliZone {
  code: string;
  name: string;
  geometry: Parameters<typeof zoneMask>[0] | null;
}

/** Zones from a GeoJSON FeatureCollection file (properties.code and .name), or the whole grid. */
function readZones(file: string | undefined): CliZone[] {
  if (!file) return [{ code: "GRID", name: "whole grid", geometry: null }];
  let json: unknown;
  try {
    json = JSON.parse(fs.readFileSync(file, "utf8"));
  } catch (err) {
    throw new CliUsageError(`--zones: cannot read ${file} as JSON: ${err instanceof Error ? err.message : String(err)}`);
  }
  const parsed = importZonesInput.safeParse(json);
  if (!parsed.success) throw new CliUsageError(`--zones: ${parsed.error.issues[0]!.path.join(".")}: ${parsed.error.issues[0]!.message}`);
  return parsed.data.features.map((f) => ({ code: f.properties.code, name: f.properties.name, geometry: f.geometry }));
}

function spatialConditionFrom(flags: Map<string, string | true>): SpatialCondition {
  const points = flags.get("min-points");
  const coverage = flags.get("min-coverage");
  if (points !== undefined && coverage !== undefined) throw new CliUsageError("Give either --min-points or --min-coverage, not both.");
  if (points !== undefined) {
    const n = Number(points);
    if (!Number.isInteger(n) || n < 1) throw new CliUsageError(`--min-points: expected a whole number ≥ 1, got "${String(points)}"`);
    return { kind: "min-points", points: n };
  }
  if (coverage !== undefined) {
    const p = Number(coverage);
    if (!(p > 0 && p <= 100)) throw new CliUsageError(`--min-coverage: expected a percentage in (0, 100], got "${String(coverage)}"`);
    return { kind: "min-coverage", percent: p };
  }
  return { kind: "any-point" };
}

/** The expression error exactly as the editor words it, with a caret under the position. */
export function formatExpressionError(expression: string, error: { message: string; position: number; length: number }): string {
  return `${error.message}\n  ${expression}\n  ${" ".repeat(error.position)}${"^".repeat(Math.max(1, error.length))}`;
}

/** `evaluate <grid file> --expr "<expression>" [--zones zones.geojson] [--min-points N | --min-coverage P] --json`. */
export const evaluateCommand: CliCommand = {
  name: "evaluate",
  summary: "Check a rule expression against every frame of a grid file (per zone)",
  usage: 'evaluate <file> --expr "<expression>" [--zones z.geojson] [--min-points N | --min-coverage P] [--json]',
  async run(args) {
    const { positional, flags } = parseCliArgs(args, ["expr", "zones", "min-points", "min-coverage"]);
    const file = positional[0];
    const expression = flags.get("expr");
    if (!file || typeof expression !== "string") throw new CliUsageError(`Usage: npm run cli -- ${this.usage}`);
    const parsed = parseRule(expression);
    if (!parsed.ok) throw new CliUsageError(formatExpressionError(expression, parsed.errors[0]!));
    const condition = spatialConditionFrom(flags);
    const zonesFlag = flags.get("zones");
    const zones = readZones(typeof zonesFlag === "string" ? zonesFlag : undefined);
    if (condition.kind === "zone-extreme") throw new CliUsageError("Zone-extreme conditions are set in the rule editor.");

    const { bytes, format } = readGridFile(file);
    const { frames } = assembleFrames(await decodeGridFile(bytes, format));
    const rule = compileRule(parsed.rule);
    const keys = [...parsed.rule.fieldKeys] as FieldKey[];
    const results = [];
    for (const frame of frames) {
      const n = frame.grid.pointCount;
      const fields: Record<string, Float32Array> = { ...allocateColumnGridOutput(n) };
      diagnoseColumnGrid(frame.grid, fields as ReturnType<typeof allocateColumnGridOutput>);
      for (const extra of frameExtraDiagnosers()) Object.assign(fields, (await extra(frame)).fields);
      const source = (key: FieldKey) => fields[key];
      const met = rule.evaluate(source, n);
      const notMet = rule.evaluateNotMet(source, n);
      const { lat, lon } = gridCoordinates(frame.geometry);
      let matchedPoints = 0;
      for (const v of met) matchedPoints += v;
      results.push({
        runTime: frame.runTime,
        validTime: frame.validTime,
        matchedPoints,
        zones: zones.map((zone) => {
          const mask = zone.geometry ? zoneMask(zone.geometry, lat, lon) : undefined;
          const summary = summariseMatches({ met, notMet, zone: mask, fields: source, summaryKeys: keys });
          const decision = evaluateSpatialCondition(condition, summary);
          return {
            code: zone.code,
            name: zone.name,
            zonePoints: summary.zonePoints,
            matchedPoints: summary.matchedPoints,
            coveragePercent: summary.coveragePercent,
            extremes: Object.fromEntries(summary.fields.map((f) => [f.key, { max: f.max, min: f.min, mean: f.mean }])),
            conditionMet: decision.met,
            reason: decision.reason,
          };
        }),
      });
    }
    const output = { expression: parsed.rule.normalised, spatialCondition: condition, frames: results };
    if (flags.has("json")) {
      process.stdout.write(`${JSON.stringify(output)}\n`);
      return 0;
    }
    process.stdout.write(`${output.expression}\n`);
    for (const f of results) {
      process.stdout.write(`${f.validTime} (run ${f.runTime}): ${f.matchedPoints} point(s) met\n`);
      for (const z of f.zones) process.stdout.write(`  ${z.code.padEnd(8)} ${z.conditionMet ? "HELD " : "no   "} ${z.reason}\n`);
    }
    return 0;
  },
};
