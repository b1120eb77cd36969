/**
 * The invented atmosphere of the demo scenario: a warm, moist sector east of a dryline that
 * creeps east through the afternoon, a capped boundary layer under steep mid-level lapse rates,
 * a strengthening southerly low-level jet, and an upper jet streak gliding north-east across the
 * domain. It only has to look plausible to a forecaster; it is never used as a check value.
 */
import { GAS_CONSTANT_DRY_AIR, STANDARD_GRAVITY } from "../../shared/meteo/constants.ts";
import type { LambertGeometry } from "../../shared/grid/geometry-types.ts";
import { coriolisParameter } from "../../shared/grid/map-factor.ts";
import { gridCoordinates } from "../../shared/grid/grid-coordinates.ts";

export const DEMO_LEVELS_HPA = [1000, 975, 950, 925, 900, 875, 850, 825, 800, 775, 750, 725, 700, 650, 600, 550, 500, 450, 400, 350, 300, 250, 200, 150, 100];

export interface DemoFrameFields {
  /** level-major, DEMO_LEVELS_HPA order */
  temperature: Float32Array;
  dewpoint: Float32Array;
  u: Float32Array;
  v: Float32Array;
  height: Float32Array;
  surfacePressure: Float32Array;
  t2m: Float32Array;
  td2m: Float32Array;
  u10: Float32Array;
  v10: Float32Array;
  surfaceHeight: Float32Array;
}

const clamp = (x: number, lo: number, hi: number) => Math.min(hi, Math.max(lo, x));
const smoothStep = (x: number) => 0.5 * (1 + Math.tanh(x));

/** Abramowitz and Stegun (1964) 7.1.26 error-function approximation (|error| < 1.5e-7). */
function erf(x: number): number {
  const sign = x < 0 ? -1 : 1;
  const a = Math.abs(x);
  const t = 1 / (1 + 0.3275911 * a);
  const y = 1 - ((((1.061405429 * t - 1.453152027) * t + 1.421413741) * t - 0.284496736) * t + 0.254829592) * t * Math.exp(-a * a);
  return sign * y;
}

/** Wind at height z (m AGL) through piecewise-linear nodes. */
function windAt(z: number, heights: readonly number[], values: readonly number[]): number {
  if (z <= heights[0]!) return values[0]!;
  for (let k = 1; k < heights.length; k++) {
    if (z <= heights[k]!) {
      const w = (z - heights[k - 1]!) / (heights[k]! - heights[k - 1]!);
      return values[k - 1]! + w * (values[k]! - values[k - 1]!);
    }
  }
  return values[values.length - 1]!;
}

/** A smooth, deterministic pattern in −1…1 made of a few drifting waves (invented texture, not physics). */
function mesoscaleTexture(x: number, y: number, hour: number): number {
  const drift = 15 * hour;
  return (
    0.45 * Math.sin((x - drift) / 90 + y / 130) +
    0.35 * Math.sin((x + 0.6 * y) / 55 + 1.7) * Math.cos((y - drift) / 75) +
    0.2 * Math.sin(x / 31 - y / 43 + 0.8 * hour)
  );
}

interface JetStreak {
  x: number;
  y: number;
  /** Axis direction, radians from east. */
  angle: number;
  speed: number;
}

/** The upper jet streak's core position (km from the domain centre) at hour t of the event. */
function jetStreakAt(t: number): JetStreak {
  return { x: -720 + 80 * t, y: -180 + 30 * t, angle: (20 * Math.PI) / 180, speed: 36 };
}

const JET_LENGTH_KM = 900;
const JET_WIDTH_KM = 260;
const JET_LEVEL_M = 10_500;

/**
 * Builds every field of one frame. `hour` is hours since the first frame of the event (0 = late
 * morning); the dryline, low-level jet and jet streak evolve with it.
 */
export function demoFrameFields(geometry: LambertGeometry, hour: number): DemoFrameFields {
  const n = geometry.nx * geometry.ny;
  const levels = DEMO_LEVELS_HPA.length;
  const out: DemoFrameFields = {
    temperature: new Float32Array(levels * n),
    dewpoint: new Float32Array(levels * n),
    u: new Float32Array(levels * n),
    v: new Float32Array(levels * n),
    height: new Float32Array(levels * n),
    surfacePressure: new Float32Array(n),
    t2m: new Float32Array(n),
    td2m: new Float32Array(n),
    u10: new Float32Array(n),
    v10: new Float32Array(n),
    surfaceHeight: new Float32Array(n),
  };
  const { lat } = gridCoordinates(geometry);
  const hydrostatic = new Float32Array(levels * n);
  const upperWeight = new Float32Array(levels * n);
  const jet = jetStreakAt(hour);
  const cosA = Math.cos(jet.angle);
  const sinA = Math.sin(jet.angle);
  const dz = 100;
  const steps = 180;
  const zCol = new Float64Array(steps + 1);
  const pCol = new Float64Array(steps + 1);
  const tCol = new Float64Array(steps + 1);
  const tdCol = new Float64Array(steps + 1);

  for (let j = 0; j < geometry.ny; j++) {
    for (let i = 0; i < geometry.nx; i++) {
      const p = j * geometry.nx + i;
      const X = ((i - (geometry.nx - 1) / 2) * geometry.dx) / 1000;
      const Y = ((j - (geometry.ny - 1) / 2) * geometry.dy) / 1000;

      // Surface: the dryline, moisture fading to the north, terrain rising to the west.
      // Mesoscale texture: a bulging dryline and patchy moisture, so maps look like weather, not geometry.
      const texture = mesoscaleTexture(X, Y, hour);
      const drylineX = -190 + 20 * hour + 0.15 * Y + 35 * Math.sin(Y / 140 + 0.3 * hour);
      const moist = smoothStep((X - drylineX) / 30) * (1 - smoothStep((Y - 340) / 80));
      const zs = clamp(650 - 0.45 * X, 250, 1300);
      const t2 = 300.5 + 3 * (1 - moist) + 2 * Math.sin((Math.PI * clamp(hour, 0, 8)) / 12) - 0.006 * Y;
      const td2 = Math.min(t2 - 1, moist * (293.8 - 0.004 * Y + 1.4 * texture) + (1 - moist) * (271 + 2 * texture));
      const mixedTop = moist * 1300 + (1 - moist) * 2900;
      const cap = moist * Math.max(0, 7.5 - 1.1 * hour);

      // Environmental temperature and dewpoint by height above ground.
      for (let k = 0; k <= steps; k++) {
        const z = k * dz;
        const zMsl = z + zs;
        let t: number;
        if (z <= mixedTop) t = t2 - 0.0085 * z;
        else if (z <= mixedTop + 250) t = t2 - 0.0085 * mixedTop + (cap * (z - mixedTop)) / 250;
        else t = t2 - 0.0085 * mixedTop + cap - 0.0078 * (Math.min(zMsl, 6000 + zs) - (mixedTop + 250 + zs)) - 0.0066 * Math.max(0, zMsl - 6000 - zs);
        t = Math.max(t, 213 + 0.002 * Math.max(0, zMsl - 14000));
        tCol[k] = t;
        const inMixed = z <= mixedTop;
        tdCol[k] = Math.min(t - 0.5, inMixed ? td2 - 0.0016 * z : t - (moist > 0.5 ? 21 : 26));
        zCol[k] = zMsl;
      }
      // Hydrostatic pressure from a sea-level pressure with a weak low to the north-west.
      const lowX = -320 + 30 * hour;
      const lowY = 360 + 12 * hour;
      const mslp = 100_900 - 500 * Math.exp(-((X - lowX) ** 2 + (Y - lowY) ** 2) / 350 ** 2);
      const tMean = t2 + 0.0065 * zs * 0.5;
      pCol[0] = mslp * Math.exp((-STANDARD_GRAVITY * zs) / (GAS_CONSTANT_DRY_AIR * tMean));
      for (let k = 1; k <= steps; k++) {
        const tv = 0.5 * (tCol[k]! + tCol[k - 1]!) * 1.004;
        pCol[k] = pCol[k - 1]! * Math.exp((-STANDARD_GRAVITY * dz) / (GAS_CONSTANT_DRY_AIR * tv));
      }

      // Winds: veering with height, a low-level jet in the moist sector, the jet streak aloft.
      const lljSpeed = 8 + 2.2 * hour;
      const windHeights = [0, 900, 3000, 6000, JET_LEVEL_M - zs, 14_000 - zs, 17_000 - zs];
      const uNodes = [moist * -1 + (1 - moist) * 7, moist * 4 + (1 - moist) * 10, 12, 22, 24, 18, 10];
      const vNodes = [moist * 9 + (1 - moist) * 6, moist * lljSpeed + (1 - moist) * 8, 12, 10, 6, 4, 0];

      // Jet streak in its own frame (along s, across n), after the Gaussian streak of Bluestein (1993).
      const dxj = X - jet.x;
      const dyj = Y - jet.y;
      const s = (dxj * cosA + dyj * sinA) * 1000;
      const nn = (-dxj * sinA + dyj * cosA) * 1000;
      const lx = JET_LENGTH_KM * 1000;
      const ly = JET_WIDTH_KM * 1000;
      const g = Math.exp(-(s * s) / (lx * lx) - (nn * nn) / (ly * ly));
      const f = coriolisParameter(lat[p]!);
      const alongStreak = jet.speed * g;
      const acrossNonDivergent = jet.speed * Math.sqrt(Math.PI) * ((ly * s) / (lx * lx)) * erf(nn / ly) * Math.exp(-(s * s) / (lx * lx));
      // Ageostrophic cross-stream wind of the entrance and exit, damped to a realistic size.
      const acrossAgeostrophic = 0.35 * (-(2 * jet.speed * s) / (f * lx * lx)) * g * (24 + jet.speed * g);
      const streamfunction = -jet.speed * ((Math.sqrt(Math.PI) * ly) / 2) * Math.exp(-(s * s) / (lx * lx)) * erf(nn / ly);
      const uJet = alongStreak * cosA - (acrossNonDivergent + acrossAgeostrophic) * sinA;
      const vJet = alongStreak * sinA + (acrossNonDivergent + acrossAgeostrophic) * cosA;

      out.surfacePressure[p] = pCol[0]!;
      out.t2m[p] = t2;
      out.td2m[p] = td2;
      out.u10[p] = uNodes[0]!;
      out.v10[p] = vNodes[0]!;
      out.surfaceHeight[p] = zs;

      for (let L = 0; L < levels; L++) {
        const pl = DEMO_LEVELS_HPA[L]! * 100;
        const index = L * n + p;
        let zAgl: number;
        let t: number;
        let td: number;
        if (pl >= pCol[0]!) {
          // Below ground: extrapolate with a standard lapse rate, as models do.
          const depth = ((GAS_CONSTANT_DRY_AIR * t2) / STANDARD_GRAVITY) * Math.log(pl / pCol[0]!);
          zAgl = -depth;
          t = t2 + 0.0065 * depth;
          td = Math.min(t - 1, td2);
        } else {
          let k = 1;
          while (k < steps && pCol[k]! > pl) k++;
          const w = Math.log(pCol[k - 1]! / pl) / Math.log(pCol[k - 1]! / pCol[k]!);
          zAgl = (k - 1 + w) * dz;
          t = tCol[k - 1]! + w * (tCol[k]! - tCol[k - 1]!);
          td = tdCol[k - 1]! + w * (tdCol[k]! - tdCol[k - 1]!);
        }
        const zMsl = zAgl + zs;
        const upper = clamp((zMsl - 4000) / 4000, 0, 1);
        const jetWeight = Math.exp(-(((zMsl - JET_LEVEL_M) / 3200) ** 2));
        const ub = windAt(Math.max(zAgl, 0), windHeights, uNodes);
        const vb = windAt(Math.max(zAgl, 0), windHeights, vNodes);
        // Heights carry the geostrophic balance of the background wind and the streak aloft.
        const balance = (f / STANDARD_GRAVITY) * (-ub * Y * 1000 + vb * X * 1000);
        out.temperature[index] = t;
        out.dewpoint[index] = td;
        out.u[index] = ub + jetWeight * uJet;
        out.v[index] = vb + jetWeight * vJet;
        hydrostatic[index] = zMsl;
        upperWeight[index] = upper;
        out.height[index] = upper * balance + jetWeight * (f / STANDARD_GRAVITY) * streamfunction;
      }
    }
  }
  // Aloft, heights follow the level's domain mean plus the balanced parts above: the invented
  // temperature contrasts would otherwise add thermal winds that the invented winds do not have.
  for (let L = 0; L < levels; L++) {
    let mean = 0;
    for (let p = 0; p < n; p++) mean += hydrostatic[L * n + p]! / n;
    for (let p = 0; p < n; p++) {
      const index = L * n + p;
      out.height[index] = out.height[index]! + (1 - upperWeight[index]!) * hydrostatic[index]! + upperWeight[index]! * mean;
    }
  }
  return out;
}
