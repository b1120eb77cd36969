/**
 * Invented, seeded grids of plausible convective columns for equality, property and speed tests (never check
 * values). Temperature falls linearly with height to a 12-km tropopause and is isothermal above, so heights on
 * pressure levels follow in closed form from the hydrostatic equation; humidity falls off with height; winds
 * veer and strengthen. Terrain raises some grounds above the lowest isobaric levels.
 */
import { GAS_CONSTANT_DRY_AIR, STANDARD_GRAVITY } from "../../shared/meteo/constants.ts";
import { allocateColumnGridOutput, type ColumnGrid, type ColumnGridOutput } from "../../shared/meteo/index.ts";
import { dewpointFromVaporPressure, saturationVaporPressure } from "../../shared/meteo/thermo/saturation-vapor-pressure.ts";
import type { ColumnProfile } from "../../shared/meteo/column/column-profile.ts";
import { seededRandom } from "../reference/helpers/seeded-random.ts";

export interface SyntheticGridOptions {
  pointCount: number;
  levelCount: number;
  seed: number;
  /** Allocates every array (lets the pool test place them on SharedArrayBuffers). */
  makeArray?: (length: number) => Float32Array;
}

const Z_TROPOPAUSE = 12000;

/** Evenly spaced isobaric levels from 1000 to 100 hPa (Pa). */
export function syntheticLevels(levelCount: number): Float64Array {
  return Float64Array.from({ length: levelCount }, (_, k) => 100000 - (k * 90000) / (levelCount - 1));
}

export function syntheticGrid(options: SyntheticGridOptions): ColumnGrid {
  const { pointCount: n, levelCount } = options;
  const make = options.makeArray ?? ((length: number) => new Float32Array(length));
  const random = seededRandom(options.seed);
  const levels = syntheticLevels(levelCount);
  const volume = n * levelCount;
  const temperature = make(volume);
  const dewpoint = make(volume);
  const height = make(volume);
  const u = make(volume);
  const v = make(volume);
  const surface = { pressure: make(n), temperature: make(n), humidity: { kind: "dewpoint" as const, values: make(n) }, u: make(n), v: make(n), height: make(n) };
  for (let point = 0; point < n; point++) {
    const terrain = random() < 0.15 ? 1500 * random() : 100 * random();
    const lapse = 0.0055 + 0.002 * random(); // K/m
    const seaLevelT = 288 + 14 * random();
    const surfaceT = seaLevelT - lapse * terrain;
    const seaLevelP = 100500 + 2000 * random();
    const exponent = STANDARD_GRAVITY / (GAS_CONSTANT_DRY_AIR * lapse);
    const pressureAt = (z: number) => seaLevelP * Math.pow((seaLevelT - lapse * Math.min(z, Z_TROPOPAUSE)) / seaLevelT, exponent);
    const tropopauseT = seaLevelT - lapse * Z_TROPOPAUSE;
    const tropopauseP = pressureAt(Z_TROPOPAUSE);
    const moistDepth = 800 + 2500 * random();
    const surfaceRh = 0.4 + 0.45 * random();
    const shear = 5 + 30 * random();
    const veer = (Math.PI / 2) * random();
    const hemisphereTurn = random() < 0.2 ? -1 : 1;
    const columnAt = (p: number) => {
      const z =
        p >= tropopauseP
          ? (seaLevelT / lapse) * (1 - Math.pow(p / seaLevelP, 1 / exponent))
          : Z_TROPOPAUSE + ((GAS_CONSTANT_DRY_AIR * tropopauseT) / STANDARD_GRAVITY) * Math.log(tropopauseP / p);
      const t = z < Z_TROPOPAUSE ? seaLevelT - lapse * z : tropopauseT;
      const above = Math.max(0, z - terrain);
      const rh = above < moistDepth ? surfaceRh : Math.max(0.05, surfaceRh * Math.exp(-(above - moistDepth) / 2500));
      const td = Math.min(t, dewpointFromVaporPressure(rh * saturationVaporPressure(t)));
      const turn = hemisphereTurn * veer * Math.min(1, above / 6000);
      const speed = 3 + shear * Math.min(1, above / 8000);
      return { z, t, td, u: speed * Math.cos(turn), v: -speed * Math.sin(turn) };
    };
    const sfcP = pressureAt(terrain);
    surface.pressure[point] = sfcP;
    surface.temperature[point] = surfaceT + 2 * random();
    surface.humidity.values[point] = Math.min(surface.temperature[point], columnAt(sfcP).td);
    surface.height[point] = terrain;
    surface.u[point] = 3;
    surface.v[point] = 0;
    for (let k = 0; k < levelCount; k++) {
      const state = columnAt(levels[k]);
      const index = k * n + point;
      temperature[index] = state.t;
      dewpoint[index] = state.td;
      height[index] = state.z;
      u[index] = state.u;
      v[index] = state.v;
    }
  }
  return { pointCount: n, levelPressures: levels, temperature, humidity: { kind: "dewpoint", values: dewpoint }, height, u, v, surface };
}

/** The column of one grid point as the per-column entry point sees it (surface first, levels above ground). */
export function columnProfileAt(grid: ColumnGrid, point: number): ColumnProfile {
  const n = grid.pointCount;
  const s = grid.surface;
  const pressure = [s.pressure[point]];
  const height = [s.height[point]];
  const temperature = [s.temperature[point]];
  const dewpoint = [s.humidity.values[point]];
  const u = [s.u[point]];
  const v = [s.v[point]];
  const order = Array.from(grid.levelPressures, (p, k) => [p, k] as const).sort((a, b) => b[0] - a[0]);
  for (const [p, k] of order) {
    if (p >= s.pressure[point]) continue;
    const index = k * n + point;
    if (!(grid.height[index] > height[height.length - 1])) continue;
    pressure.push(p);
    height.push(grid.height[index]);
    temperature.push(grid.temperature[index]);
    dewpoint.push(grid.humidity.values[index]);
    u.push(grid.u[index]);
    v.push(grid.v[index]);
  }
  return { pressure, height, temperature, dewpoint, u, v };
}

export function emptyOutput(grid: ColumnGrid, makeArray?: (length: number) => Float32Array): ColumnGridOutput {
  return allocateColumnGridOutput(grid.pointCount, makeArray);
}
