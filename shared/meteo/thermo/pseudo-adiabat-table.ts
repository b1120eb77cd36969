import { ICE_POINT, LN_REFERENCE_PRESSURE } from "../constants.ts";
import { saturationMixingRatio } from "./humidity.ts";
import { integratePseudoAdiabat } from "./pseudo-adiabat.ts";
import { virtualTemperature } from "./temperature.ts";

/**
 * Precomputed pseudo-adiabats for grid work: T(θw, ln p) and the saturated parcel's virtual temperature
 * Tv(θw, ln p), sampled on a regular θw × ln p lattice and read back with bilinear interpolation.
 * Every column is built once with the reference RK4 integrator, so the table and the reference path
 * follow the same ODE; only the interpolation error differs (measured in tests/reference).
 *
 * Layout: θw-major, value(j, i) at [j * rowCount + i], so one parcel walks memory contiguously upward.
 */
export interface PseudoAdiabatTableSpec {
  /** Lowest and highest θw (°C) and the θw spacing (K). */
  thetaWMinCelsius: number;
  thetaWMaxCelsius: number;
  thetaWStep: number;
  /** Pressure range (Pa) and ln-p spacing. */
  pressureMin: number;
  pressureMax: number;
  lnPressureStep: number;
}

/** 0.5 K × 0.01 in ln p: the finer spacing of the error budget; 5.3e4 entries, ~0.85 MB for both tables. */
export const DEFAULT_TABLE_SPEC: PseudoAdiabatTableSpec = {
  thetaWMinCelsius: -60,
  thetaWMaxCelsius: 45,
  thetaWStep: 0.5,
  pressureMin: 9000,
  pressureMax: 110000,
  lnPressureStep: 0.01,
};

export class PseudoAdiabatTable {
  readonly thetaWMin: number; // K
  readonly thetaWStep: number;
  readonly columnCount: number;
  readonly lnPressureMin: number;
  readonly lnPressureStep: number;
  readonly rowCount: number;
  readonly temperature: Float64Array;
  readonly virtualTemperature: Float64Array;

  constructor(spec: PseudoAdiabatTableSpec = DEFAULT_TABLE_SPEC) {
    this.thetaWMin = spec.thetaWMinCelsius + ICE_POINT;
    this.thetaWStep = spec.thetaWStep;
    this.columnCount = Math.round((spec.thetaWMaxCelsius - spec.thetaWMinCelsius) / spec.thetaWStep) + 1;
    this.lnPressureMin = Math.log(spec.pressureMin);
    this.lnPressureStep = spec.lnPressureStep;
    this.rowCount = Math.ceil((Math.log(spec.pressureMax) - this.lnPressureMin) / spec.lnPressureStep) + 1;
    const size = this.columnCount * this.rowCount;
    this.temperature = new Float64Array(size);
    this.virtualTemperature = new Float64Array(size);
    for (let j = 0; j < this.columnCount; j++) this.fillColumn(j);
  }

  /** Integrates one pseudo-adiabat from 1000 hPa outward, one row at a time (each step ≤ 0.05 in ln p). */
  private fillColumn(j: number): void {
    const rows = this.rowCount;
    const base = j * rows;
    const anchor = Math.min(rows - 1, Math.max(0, Math.round((LN_REFERENCE_PRESSURE - this.lnPressureMin) / this.lnPressureStep)));
    const thetaW = this.thetaWMin + j * this.thetaWStep;
    this.temperature[base + anchor] = integratePseudoAdiabat(thetaW, LN_REFERENCE_PRESSURE, this.rowLnPressure(anchor));
    for (let i = anchor - 1; i >= 0; i--) {
      this.temperature[base + i] = integratePseudoAdiabat(this.temperature[base + i + 1], this.rowLnPressure(i + 1), this.rowLnPressure(i));
    }
    for (let i = anchor + 1; i < rows; i++) {
      this.temperature[base + i] = integratePseudoAdiabat(this.temperature[base + i - 1], this.rowLnPressure(i - 1), this.rowLnPressure(i));
    }
    for (let i = 0; i < rows; i++) {
      const t = this.temperature[base + i];
      const p = Math.exp(this.rowLnPressure(i));
      this.virtualTemperature[base + i] = virtualTemperature(t, saturationMixingRatio(t, p));
    }
  }

  rowLnPressure(row: number): number {
    return this.lnPressureMin + row * this.lnPressureStep;
  }

  /** Fractional row position of ln p; NaN outside the table. */
  rowPosition(lnPressure: number): number {
    const pos = (lnPressure - this.lnPressureMin) / this.lnPressureStep;
    return pos >= 0 && pos <= this.rowCount - 1 ? pos : Number.NaN;
  }

  /** Fractional column position of θw (K); NaN outside the table. */
  columnPosition(thetaW: number): number {
    const pos = (thetaW - this.thetaWMin) / this.thetaWStep;
    return pos >= 0 && pos <= this.columnCount - 1 ? pos : Number.NaN;
  }

  /** Bilinear read of `values` (one of the two tables) at fractional positions. */
  sample(values: Float64Array, columnPos: number, rowPos: number): number {
    let j = Math.floor(columnPos);
    let i = Math.floor(rowPos);
    if (j >= this.columnCount - 1) j = this.columnCount - 2;
    if (i >= this.rowCount - 1) i = this.rowCount - 2;
    const fj = columnPos - j;
    const fi = rowPos - i;
    const a = j * this.rowCount + i;
    const b = a + this.rowCount;
    const lower = values[a] + fi * (values[a + 1] - values[a]);
    const upper = values[b] + fi * (values[b + 1] - values[b]);
    return lower + fj * (upper - lower);
  }

  /**
   * Column position (fractional θw index) of the pseudo-adiabat through (temperature, row position):
   * the exact inverse of the bilinear interpolant in θw, found by bisection. NaN outside the table.
   */
  columnPositionOf(temperature: number, rowPos: number): number {
    let i = Math.floor(rowPos);
    if (i >= this.rowCount - 1) i = this.rowCount - 2;
    const fi = rowPos - i;
    const t = this.temperature;
    const rows = this.rowCount;
    let lo = 0;
    let hi = this.columnCount - 1;
    const tLo = t[i] + fi * (t[i + 1] - t[i]);
    const tHi = t[hi * rows + i] + fi * (t[hi * rows + i + 1] - t[hi * rows + i]);
    if (!(temperature >= tLo && temperature <= tHi)) return Number.NaN;
    while (hi - lo > 1) {
      const mid = (lo + hi) >> 1;
      const k = mid * rows + i;
      const tMid = t[k] + fi * (t[k + 1] - t[k]);
      if (tMid <= temperature) lo = mid;
      else hi = mid;
    }
    const kLo = lo * rows + i;
    const kHi = hi * rows + i;
    const vLo = t[kLo] + fi * (t[kLo + 1] - t[kLo]);
    const vHi = t[kHi] + fi * (t[kHi + 1] - t[kHi]);
    return lo + (temperature - vLo) / (vHi - vLo);
  }
}

let sharedTable: PseudoAdiabatTable | null = null;

/** The process-wide default table, built on first use (~50k RK4 steps, tens of milliseconds). */
export function getPseudoAdiabatTable(): PseudoAdiabatTable {
  if (sharedTable === null) sharedTable = new PseudoAdiabatTable();
  return sharedTable;
}
