import { COLUMN_FIELD_KEYS, type ColumnFieldKey } from "../../fields.ts";
import { GridShapeError } from "../errors.ts";

/** How a humidity array is expressed: dewpoint (K), specific humidity (kg kg⁻¹) or relative humidity (fraction 0-1). */
export type HumidityKind = "dewpoint" | "specificHumidity" | "relativeHumidity";

export interface HumidityField<A extends ArrayLike<number> = Float32Array> {
  readonly kind: HumidityKind;
  readonly values: A;
}

/**
 * A whole grid of columns in structure-of-arrays form, SI units. 3-D arrays are level-major:
 * value(level, point) = array[level * pointCount + point]. Levels are isobaric (any order); levels at or
 * below the ground of a point (p ≥ p_sfc) are skipped for that column, as are levels with a NaN value.
 */
export interface ColumnGrid {
  readonly pointCount: number;
  /** Pressure of each isobaric level (Pa). */
  readonly levelPressures: ArrayLike<number>;
  readonly temperature: Float32Array;
  readonly humidity: HumidityField;
  /** Geopotential height (gpm). */
  readonly height: Float32Array;
  readonly u: Float32Array;
  readonly v: Float32Array;
  readonly surface: {
    readonly pressure: Float32Array;
    /** 2-m temperature (K). */
    readonly temperature: Float32Array;
    /** 2-m humidity. */
    readonly humidity: HumidityField;
    /** 10-m wind (m s⁻¹). */
    readonly u: Float32Array;
    readonly v: Float32Array;
    /** Ground geopotential height (gpm). */
    readonly height: Float32Array;
  };
}

/** One Float32Array per column field, NaN where undefined or outside the QC range. */
export type ColumnGridOutput = Record<ColumnFieldKey, Float32Array>;

/** Allocates the outputs; pass `makeArray` to place them elsewhere (e.g. on SharedArrayBuffers). */
export function allocateColumnGridOutput(pointCount: number, makeArray: (length: number) => Float32Array = (n) => new Float32Array(n)): ColumnGridOutput {
  const out = {} as ColumnGridOutput;
  for (const key of COLUMN_FIELD_KEYS) out[key] = makeArray(pointCount);
  return out;
}

function expectLength(name: string, array: ArrayLike<number> | undefined, length: number): void {
  if (!array || array.length !== length) {
    throw new GridShapeError(`${name}: expected ${length} values, received ${array ? array.length : "nothing"}`);
  }
}

/** Checks every array against the declared shape; throws GridShapeError naming the array. */
export function validateColumnGrid(grid: ColumnGrid): void {
  const n = grid.pointCount;
  if (!Number.isInteger(n) || n < 0) throw new GridShapeError(`pointCount: expected a non-negative integer, received ${n}`);
  const levels = grid.levelPressures.length;
  if (levels < 1) throw new GridShapeError("levelPressures: expected at least one isobaric level, received none");
  for (let k = 0; k < levels; k++) {
    if (!(grid.levelPressures[k] > 0)) throw new GridShapeError(`levelPressures[${k}]: expected a positive pressure in Pa, received ${grid.levelPressures[k]}`);
  }
  const volume = levels * n;
  expectLength("temperature", grid.temperature, volume);
  expectLength(`humidity (${grid.humidity.kind})`, grid.humidity.values, volume);
  expectLength("height", grid.height, volume);
  expectLength("u", grid.u, volume);
  expectLength("v", grid.v, volume);
  const s = grid.surface;
  expectLength("surface.pressure", s.pressure, n);
  expectLength("surface.temperature", s.temperature, n);
  expectLength(`surface.humidity (${s.humidity.kind})`, s.humidity.values, n);
  expectLength("surface.u", s.u, n);
  expectLength("surface.v", s.v, n);
  expectLength("surface.height", s.height, n);
}

export function validateColumnGridOutput(output: ColumnGridOutput, pointCount: number): void {
  for (const key of COLUMN_FIELD_KEYS) expectLength(`output.${key}`, output[key], pointCount);
}
