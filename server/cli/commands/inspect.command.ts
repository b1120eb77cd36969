import { nearestGridPoint, gridCoordinates } from "../../../shared/grid/grid-coordinates.ts";
import type { GridGeometry } from "../../../shared/grid/geometry-types.ts";
import { readGridFile } from "../read-grid-file.ts";
import { decodeGrib2, loadGrib2Codecs } from "../../ingest/grib2/index.ts";
import { decodeNetcdfForInspect } from "../../ingest/netcdf-inspect.ts";
import { CliUsageError, parseCliArgs, type CliCommand } from "../command.ts";
import { parseLatLon } from "../lat-lon.ts";

/** One listed message (GRIB2) or variable level (NetCDF), in the file's own units. */
export interface InspectEntry {
  parameter: string;
  level: number | null;
  levelType: string;
  unit: string;
  nx: number;
  ny: number;
  projection: GridGeometry["kind"];
  missing: number;
  value?: number | null;
  i?: number;
  j?: number;
  lat?: number;
  lon?: number;
}

export interface InspectableField {
  parameter: string;
  level: number | null;
  levelType: string;
  unit: string;
  geometry: GridGeometry;
  values: Float32Array;
  missing: number;
}

/** Lists a grid file's contents; with a point, adds the decoded value at the nearest grid point. */
export function inspectFields(fields: readonly InspectableField[], at: { lat: number; lon: number } | null): InspectEntry[] {
  return fields.map((f) => {
    const entry: InspectEntry = {
      parameter: f.parameter,
      level: f.level,
      levelType: f.levelType,
      unit: f.unit,
      nx: f.geometry.nx,
      ny: f.geometry.ny,
      projection: f.geometry.kind,
      missing: f.missing,
    };
    if (!at) return entry;
    const point = nearestGridPoint(f.geometry, at.lat, at.lon);
    if (!point) return { ...entry, value: null };
    const coords = gridCoordinates(f.geometry);
    const value = f.values[point.index]!;
    return { ...entry, value: Number.isNaN(value) ? null : value, i: point.i, j: point.j, lat: coords.lat[point.index]!, lon: coords.lon[point.index]! };
  });
}

export async function readInspectable(file: string): Promise<{ format: "grib2" | "netcdf"; fields: InspectableField[] }> {
  const { bytes, format } = readGridFile(file);
  if (format === "grib2") {
    await loadGrib2Codecs();
    const messages = decodeGrib2(bytes);
    return {
      format,
      fields: messages.map((m) => ({ parameter: m.parameter.shortName, level: m.level, levelType: m.levelType, unit: m.parameter.unit, geometry: m.geometry, values: m.values, missing: m.missingCount })),
    };
  }
  return { format, fields: await decodeNetcdfForInspect(bytes) };
}

/** `inspect <file> [--at LAT,LON] --json`. */
export const inspectCommand: CliCommand = {
  name: "inspect",
  summary: "List a GRIB2/NetCDF file's messages or variables (values at a point with --at)",
  usage: "inspect <file> [--at LAT,LON] [--json]",
  async run(args) {
    const { positional, flags } = parseCliArgs(args, ["at"]);
    const file = positional[0];
    if (!file || positional.length > 1) throw new CliUsageError(`Usage: npm run cli -- ${this.usage}`);
    const at = flags.has("at") ? parseLatLon(flags.get("at")) : null;
    const { format, fields } = await readInspectable(file);
    const messages = inspectFields(fields, at);
    if (flags.has("json")) {
      process.stdout.write(`${JSON.stringify({ format, messages })}\n`);
      return 0;
    }
    process.stdout.write(`${format.toUpperCase()}: ${messages.length} field(s)\n`);
    for (const [k, m] of messages.entries()) {
      const where = m.value === undefined ? "" : `  value ${m.value ?? "—"} at i=${m.i ?? "—"} j=${m.j ?? "—"}`;
      process.stdout.write(`${String(k + 1).padStart(4)}  ${m.parameter.padEnd(10)} ${m.levelType.padEnd(18)} ${String(m.level ?? "").padEnd(8)} ${m.unit.padEnd(9)} ${m.nx}x${m.ny} ${m.projection}  missing ${m.missing}${where}\n`);
    }
    return 0;
  },
};
