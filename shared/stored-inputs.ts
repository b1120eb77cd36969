/**
 * The model fields every frame keeps beside its diagnostics, named once for the server (which writes
 * them) and the client (which draws and labels them). Storage units are SI; `display` turns them into
 * the units staff read (°C, hPa, kt), in the same form as the field catalogue's display units.
 */
import type { DisplayUnit } from "./fields.ts";

export interface StoredInputDefinition {
  readonly key: string;
  /** Storage unit, as written to the field's metadata row. */
  readonly unit: string;
  readonly label: string;
  readonly display: DisplayUnit;
  /** True when negative values carry meaning of their own (wind components). */
  readonly signed: boolean;
}

const KNOTS_PER_MPS = 3600 / 1852;
const celsius: DisplayUnit = { unit: "°C", scale: 1, offset: -273.15, decimals: 1 };
const knots: DisplayUnit = { unit: "kt", scale: KNOTS_PER_MPS, offset: 0, decimals: 0 };

/** Surface fields: one value per grid point, shown on the map. */
export const STORED_INPUTS_2D = [
  { key: "t_2m", unit: "K", label: "2 m temperature", display: celsius, signed: false },
  { key: "td_2m", unit: "K", label: "2 m dewpoint", display: celsius, signed: false },
  { key: "p_sfc", unit: "Pa", label: "surface pressure", display: { unit: "hPa", scale: 0.01, offset: 0, decimals: 1 }, signed: false },
  { key: "z_sfc", unit: "m", label: "surface height", display: { unit: "m", scale: 1, offset: 0, decimals: 0 }, signed: false },
  { key: "u_10m", unit: "m s-1", label: "10 m wind, east component", display: knots, signed: true },
  { key: "v_10m", unit: "m s-1", label: "10 m wind, north component", display: knots, signed: true },
] as const satisfies readonly StoredInputDefinition[];

/** Isobaric fields: level-major volumes, read a column at a time for soundings. */
export const STORED_INPUTS_3D = [
  { key: "t", unit: "K", label: "temperature", display: celsius, signed: false },
  { key: "td", unit: "K", label: "dewpoint", display: celsius, signed: false },
  { key: "z", unit: "m", label: "geopotential height", display: { unit: "m", scale: 1, offset: 0, decimals: 0 }, signed: false },
  { key: "u", unit: "m s-1", label: "wind, east component", display: knots, signed: true },
  { key: "v", unit: "m s-1", label: "wind, north component", display: knots, signed: true },
] as const satisfies readonly StoredInputDefinition[];

export type StoredInput2dKey = (typeof STORED_INPUTS_2D)[number]["key"];
export type StoredInput3dKey = (typeof STORED_INPUTS_3D)[number]["key"];

const BY_KEY = new Map<string, StoredInputDefinition>([...STORED_INPUTS_2D, ...STORED_INPUTS_3D].map((input) => [input.key, input]));

/** The definition of a stored model field, or undefined for any other key. */
export function storedInputByKey(key: string): StoredInputDefinition | undefined {
  return BY_KEY.get(key);
}
