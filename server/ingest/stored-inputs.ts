import { dewpointFrom } from "../../shared/meteo/column/diagnose-grid.ts";
import type { FrameInput } from "./assemble-frames.ts";

/**
 * Model fields kept beside the diagnostics: the surface ones are shown on the map; the 3-D ones
 * (level-major, levels as in the frame) let anyone open the sounding at any grid point later.
 * Humidity is stored as dewpoint whatever form the file carried.
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

export const INPUT_FIELDS_2D: readonly StoredInput[] = [
  { key: "t_2m", unit: "K", label: "2 m temperature", extract: (f) => f.grid.surface.temperature },
  {
    key: "td_2m",
    unit: "K",
    label: "2 m dewpoint",
    extract: (f) => dewpoints(f.grid.surface.humidity.kind, f.grid.surface.humidity.values, f.grid.surface.temperature, (i) => f.grid.surface.pressure[i]!),
  },
  { key: "p_sfc", unit: "Pa", label: "surface pressure", extract: (f) => f.grid.surface.pressure },
  { key: "z_sfc", unit: "m", label: "surface height", extract: (f) => f.grid.surface.height },
  { key: "u_10m", unit: "m s-1", label: "10 m wind, east component", extract: (f) => f.grid.surface.u },
  { key: "v_10m", unit: "m s-1", label: "10 m wind, north component", extract: (f) => f.grid.surface.v },
];

export const INPUT_FIELDS_3D: readonly StoredInput[] = [
  { key: "t", unit: "K", label: "temperature", extract: (f) => f.grid.temperature },
  {
    key: "td",
    unit: "K",
    label: "dewpoint",
    extract: (f) => {
      const n = f.grid.pointCount;
      return dewpoints(f.grid.humidity.kind, f.grid.humidity.values, f.grid.temperature, (i) => f.levels[Math.floor(i / n)]!);
    },
  },
  { key: "z", unit: "m", label: "geopotential height", extract: (f) => f.grid.height },
  { key: "u", unit: "m s-1", label: "wind, east component", extract: (f) => f.grid.u },
  { key: "v", unit: "m s-1", label: "wind, north component", extract: (f) => f.grid.v },
];
