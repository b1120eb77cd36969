import { dewpointFrom } from "../../shared/meteo/column/diagnose-grid.ts";
import { storedInputByKey, type StoredInput2dKey, type StoredInput3dKey } from "../../shared/stored-inputs.ts";
import type { FrameInput } from "./assemble-frames.ts";

/**
 * Model fields kept beside the diagnostics: the surface ones are shown on the map; the 3-D ones
 * (level-major, levels as in the frame) let anyone open the sounding at any grid point later.
 * Humidity is stored as dewpoint whatever form the file carried. Keys, units and labels come from
 * shared/stored-inputs.ts, which the client reads too.
 */
export interface StoredInput {
  key: string;
  unit: string;
  label: string;
  extract(frame: FrameInput): Float32Array;
}

function dewpoints(kind: FrameInput["grid"]["humidity"]["kind"], humidity: Float32Array, temperature: Float32Array, pressureAt: (i: number) => number): Float32Array {
  const out = new Float32Array(humidity.length);
  for (let i = 0; i < out.length; i++) out[i] = dewpointFrom(kind, humidity[i]!, temperature[i]!, pressureAt(i));
  return out;
}

function input(key: StoredInput2dKey | StoredInput3dKey, extract: StoredInput["extract"]): StoredInput {
  const { unit, label } = storedInputByKey(key)!;
  return { key, unit, label, extract };
}

export const INPUT_FIELDS_2D: readonly StoredInput[] = [
  input("t_2m", (f) => f.grid.surface.temperature),
  input("td_2m", (f) => dewpoints(f.grid.surface.humidity.kind, f.grid.surface.humidity.values, f.grid.surface.temperature, (i) => f.grid.surface.pressure[i]!)),
  input("p_sfc", (f) => f.grid.surface.pressure),
  input("z_sfc", (f) => f.grid.surface.height),
  input("u_10m", (f) => f.grid.surface.u),
  input("v_10m", (f) => f.grid.surface.v),
];

export const INPUT_FIELDS_3D: readonly StoredInput[] = [
  input("t", (f) => f.grid.temperature),
  input("td", (f) => {
    const n = f.grid.pointCount;
    return dewpoints(f.grid.humidity.kind, f.grid.humidity.values, f.grid.temperature, (i) => f.levels[Math.floor(i / n)]!);
  }),
  input("z", (f) => f.grid.height),
  input("u", (f) => f.grid.u),
  input("v", (f) => f.grid.v),
];
