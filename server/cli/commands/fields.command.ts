import { FIELDS } from "../../../shared/fields.ts";
import { gridCoordinates, nearestGridPoint } from "../../../shared/grid/grid-coordinates.ts";
import { allocateColumnGridOutput } from "../../../shared/meteo/column/column-grid.ts";
import { diagnoseColumnGrid } from "../../../shared/meteo/column/diagnose-grid.ts";
import { detectGridFormat, describeUnknownFormat } from "../../ingest/detect-format.ts";
import { decodeGridFile } from "../../ingest/decode-file.ts";
import { assembleFrames } from "../../ingest/assemble-frames.ts";
import { readGridFile } from "../read-grid-file.ts";
import { frameExtraDiagnosers } from "../../ingest/frame-diagnostics.ts";
import { CliUsageError, parseCliArgs, type CliCommand } from "../command.ts";
import { parseLatLon } from "../lat-lon.ts";

export interface FieldsAtPoint {
  runTime: string;
  validTime: string;
  i: number;
  j: number;
  lat: number;
  lon: number;
  fields: Record<string, number | null>;
}

/**
 * Every catalogue field at the grid point nearest `at`, for each frame of a file. Column fields are
 * computed for that one column only; horizontal (jet) fields need the whole frame.
 */
export async function fieldsAtPoint(bytes: Uint8Array, at: { lat: number; lon: number }, time: string | null): Promise<FieldsAtPoint[]> {
  const format = detectGridFormat(bytes.subarray(0, 16));
  if (!format) throw new CliUsageError(describeUnknownFormat(bytes.subarray(0, 16)));
  const { frames } = assembleFrames(await decodeGridFile(bytes, format));
  const selected = time ? frames.filter((f) => Date.parse(f.validTime) === Date.parse(time)) : frames;
  if (time && selected.length === 0) throw new CliUsageError(`No frame is valid at ${time}; the file holds ${frames.map((f) => f.validTime).join(", ")}.`);
  const results: FieldsAtPoint[] = [];
  for (const frame of selected) {
    const point = nearestGridPoint(frame.geometry, at.lat, at.lon);
    if (!point) throw new CliUsageError(`The point ${at.lat}, ${at.lon} lies outside the grid of ${frame.validTime}.`);
    const columns = allocateColumnGridOutput(frame.grid.pointCount);
    diagnoseColumnGrid(frame.grid, columns, undefined, { start: point.index, end: point.index + 1 });
    const extras: Record<string, Float32Array> = {};
    for (const extra of frameExtraDiagnosers()) Object.assign(extras, (await extra(frame)).fields);
    const fields: Record<string, number | null> = {};
    for (const def of FIELDS) {
      const array = (columns as Record<string, Float32Array>)[def.key] ?? extras[def.key];
      const value = array ? array[point.index]! : Number.NaN;
      fields[def.key] = Number.isNaN(value) ? null : value;
    }
    const coords = gridCoordinates(frame.geometry);
    results.push({ runTime: frame.runTime, validTime: frame.validTime, i: point.i, j: point.j, lat: coords.lat[point.index]!, lon: coords.lon[point.index]!, fields });
  }
  return results;
}

/** `fields <file> --at LAT,LON [--time ISO] --json`. */
export const fieldsCommand: CliCommand = {
  name: "fields",
  summary: "Every catalogue field at the nearest grid point of each frame of a grid file",
  usage: "fields <file> --at LAT,LON [--time ISO] [--json]",
  async run(args) {
    const { positional, flags } = parseCliArgs(args, ["at", "time"]);
    const file = positional[0];
    if (!file || positional.length > 1 || !flags.has("at")) throw new CliUsageError(`Usage: npm run cli -- ${this.usage}`);
    const at = parseLatLon(flags.get("at"));
    const timeFlag = flags.get("time");
    if (timeFlag !== undefined && (typeof timeFlag !== "string" || Number.isNaN(Date.parse(timeFlag)))) throw new CliUsageError(`--time: "${String(timeFlag)}" is not an ISO time`);
    const { bytes } = readGridFile(file);
    const frames = await fieldsAtPoint(bytes, at, typeof timeFlag === "string" ? timeFlag : null);
    if (flags.has("json")) {
      process.stdout.write(`${JSON.stringify({ frames })}\n`);
      return 0;
    }
    for (const f of frames) {
      process.stdout.write(`${f.validTime} (run ${f.runTime}) at i=${f.i} j=${f.j} (${f.lat.toFixed(3)}, ${f.lon.toFixed(3)})\n`);
      for (const [key, value] of Object.entries(f.fields)) process.stdout.write(`  ${key.padEnd(20)} ${value === null ? "—" : value.toPrecision(6)}\n`);
    }
    return 0;
  },
};
