import type { InspectableField } from "../cli/commands/inspect.command.ts";
import { decodeNetcdf } from "./netcdf/index.ts";

function nanCount(values: Float32Array): number {
  let n = 0;
  for (let i = 0; i < values.length; i++) if (values[i] !== values[i]) n++;
  return n;
}

/**
 * NetCDF variables as inspect entries: one per variable and level, in variable order, at the
 * first time. Values carry the decoder's CF unit conversion (the entry's unit says which).
 */
export async function decodeNetcdfForInspect(bytes: Uint8Array): Promise<InspectableField[]> {
  const dataset = await decodeNetcdf(bytes);
  const fields: InspectableField[] = [];
  for (const v of dataset.variables) {
    const first = v.values[0] ?? [];
    first.forEach((values, k) =>
      fields.push({
        parameter: v.name,
        level: v.levels === null ? null : v.levels[k]!,
        levelType: v.levelType,
        unit: v.units,
        geometry: v.geometry,
        values,
        missing: nanCount(values),
      }),
    );
  }
  return fields;
}
