/**
 * Jet-level horizontal diagnostics on a 1000 × 1000 Lambert grid (5 km), one core: smoothing, divergence,
 * vorticity, geostrophic and ageostrophic wind, frontogenesis at 850 and 700 hPa, natural coordinates and the
 * streak labelling, stage by stage, then the whole `computeJetFields`. Target: under 1 s in total.
 *
 * The frame is synthetic (invented for the benchmark, never a check value): two Gaussian jet streaks in a
 * westerly current over a height field in rough balance with it, and smooth low-level temperature waves.
 */
import type { LambertGeometry } from "../../shared/grid/geometry-types.ts";
import { gridCoordinates } from "../../shared/grid/grid-coordinates.ts";
import { horizontalGridFor } from "../../shared/meteo/jet/horizontal-grid.ts";
import { windOnGridAxes, rotateToEarthInPlace } from "../../shared/meteo/jet/wind-basis.ts";
import { gaussianSmooth } from "../../shared/meteo/jet/smoothing.ts";
import { GridScratch } from "../../shared/meteo/jet/grid-scratch.ts";
import { allocateVelocityGradient, divergence, relativeVorticity, velocityGradient } from "../../shared/meteo/jet/operators.ts";
import { geostrophicWind, ageostrophicWind } from "../../shared/meteo/jet/geostrophic.ts";
import { petterssenFrontogenesis, potentialTemperatureOnLevel } from "../../shared/meteo/jet/frontogenesis.ts";
import { allocateNaturalCoordinateFields, naturalCoordinates } from "../../shared/meteo/jet/natural-coordinates.ts";
import { labelJetStreaks } from "../../shared/meteo/jet/label-streaks.ts";
import { computeJetFields, type JetInput } from "../../shared/meteo/jet/compute-jet-fields.ts";
import { resolveJetSettings } from "../../shared/meteo/jet/jet-settings.ts";

const SIDE = 1000;
const POINTS = SIDE * SIDE;
const REPEATS = 3;

const geometry: LambertGeometry = {
  kind: "lambert",
  nx: SIDE,
  ny: SIDE,
  earthRadius: 6_371_229,
  uvRelativeToGrid: false,
  lat0: 16,
  lon0: -122,
  dx: 5_000,
  dy: 5_000,
  lonV: -97,
  latin1: 38.5,
  latin2: 38.5,
};

export async function run(): Promise<void> {
  let t = performance.now();
  const input = buildFrame();
  console.log(`frame: ${SIDE} x ${SIDE} Lambert grid, 5 km, built in ${seconds(t)} s`);
  t = performance.now();
  const grid = horizontalGridFor(geometry);
  console.log(`grid metric and coordinates (once per geometry, cached): ${seconds(t)} s`);

  const settings = resolveJetSettings();
  const scratch = new GridScratch();
  const stages: Array<[string, () => unknown]> = [];
  let u: Float32Array = new Float32Array(POINTS);
  let v: Float32Array = new Float32Array(POINTS);
  const height = new Float32Array(POINTS);
  const div = new Float32Array(POINTS);
  const vort = new Float32Array(POINTS);
  const geo = { u: new Float32Array(POINTS), v: new Float32Array(POINTS) };
  const ageo = { u: new Float32Array(POINTS), v: new Float32Array(POINTS) };
  const fgen = new Float32Array(POINTS);
  const natural = allocateNaturalCoordinateFields(POINTS);
  const tensor = allocateVelocityGradient(POINTS);

  stages.push(["rotate winds to grid axes", () => ({ u, v } = windOnGridAxes(grid, input.u, input.v, false, u, v))]);
  stages.push(["smoothing u, v, Z (75 km)", () => {
    gaussianSmooth(grid, u, settings.smoothingSigma, u, scratch);
    gaussianSmooth(grid, v, settings.smoothingSigma, v, scratch);
    gaussianSmooth(grid, input.height, settings.smoothingSigma, height, scratch);
  }]);
  stages.push(["divergence", () => divergence(grid, u, v, div)]);
  stages.push(["vorticity", () => relativeVorticity(grid, u, v, vort)]);
  stages.push(["geostrophic wind", () => geostrophicWind(grid, height, geo.u, geo.v)]);
  stages.push(["ageostrophic wind + rotation to Earth", () => {
    ageostrophicWind(u, v, geo.u, geo.v, ageo.u, ageo.v);
    rotateToEarthInPlace(grid, geo.u, geo.v);
    rotateToEarthInPlace(grid, ageo.u, ageo.v);
  }]);
  stages.push(["natural coordinates (tensor, speed, ∂S/∂s, ∂S/∂n, curvature)", () => naturalCoordinates(grid, u, v, natural, velocityGradient(grid, u, v, tensor), scratch)]);
  stages.push(["frontogenesis 850 + 700 hPa (incl. smoothing u, v, θ)", () => {
    for (const [level, pressure] of [[input.p850!, 85_000], [input.p700!, 70_000]] as const) {
      const wind = windOnGridAxes(grid, level.u, level.v, false, scratch.float32("lowerU", POINTS), scratch.float32("lowerV", POINTS));
      gaussianSmooth(grid, wind.u, settings.smoothingSigma, wind.u, scratch);
      gaussianSmooth(grid, wind.v, settings.smoothingSigma, wind.v, scratch);
      const theta = potentialTemperatureOnLevel(level.temperature, pressure, scratch.float32("theta", POINTS));
      gaussianSmooth(grid, theta, settings.smoothingSigma, theta, scratch);
      petterssenFrontogenesis(grid, theta, wind.u, wind.v, fgen, velocityGradient(grid, wind.u, wind.v, tensor), scratch);
    }
  }]);
  stages.push(["labelling (cores, axes, assignment, quadrants, flags)", () => labelJetStreaks(grid, { u, v, speed: natural.speed, divergence: div }, settings, scratch)]);

  // Stages depend on each other, so each repeat runs them in order; the best time of each stage is kept.
  const best = stages.map(() => Infinity);
  for (let r = 0; r < REPEATS; r++) {
    stages.forEach(([, stage], i) => {
      const start = performance.now();
      stage();
      best[i] = Math.min(best[i], (performance.now() - start) / 1000);
    });
  }
  console.log(`stages (best of ${REPEATS}, scratch arrays reused):`);
  stages.forEach(([name], i) => console.log(`  ${name.padEnd(66)} ${best[i].toFixed(3)} s`));
  const total = best.reduce((a, b) => a + b, 0);
  console.log(`  ${"sum of stages".padEnd(66)} ${total.toFixed(3)} s`);

  const timeWhole = (label: string, make: () => GridScratch) => {
    let wall = Infinity;
    let cpu = Infinity;
    let streaks = 0;
    for (let r = 0; r < REPEATS; r++) {
      const options = { scratch: make() };
      const startCpu = process.cpuUsage();
      const start = performance.now();
      const result = computeJetFields(input, undefined, options);
      wall = Math.min(wall, (performance.now() - start) / 1000);
      const used = process.cpuUsage(startCpu);
      cpu = Math.min(cpu, (used.user + used.system) / 1e6);
      streaks = result.streaks.length;
    }
    console.log(`computeJetFields, ${label} (24 fields + QC, ${streaks} streak(s)), best of ${REPEATS}: ${wall.toFixed(3)} s wall, ${cpu.toFixed(3)} s CPU`);
    return { wall, cpu };
  };
  timeWhole("fresh scratch each call", () => new GridScratch());
  const steady = timeWhole("scratch kept between frames", () => scratch);
  console.log(steady.wall < 1 ? "target (< 1 s) met" : `target (< 1 s) ${steady.cpu < 1 ? "met in CPU time, not in wall time (busy machine?)" : "NOT met"}`);
}

function seconds(since: number): string {
  return ((performance.now() - since) / 1000).toFixed(3);
}

/** Two streaks (60 and 50 m/s) on a 20 m/s westerly, Earth-relative, and temperature waves at 850/700 hPa. */
function buildFrame(): JetInput {
  const { lat, lon } = gridCoordinates(geometry);
  const u = new Float32Array(POINTS);
  const v = new Float32Array(POINTS);
  const height = new Float32Array(POINTS);
  const t850 = new Float32Array(POINTS);
  const t700 = new Float32Array(POINTS);
  const streaks = [
    { lat: 40, lon: -105, speed: 40, halfLength: 11, halfWidth: 3 },
    { lat: 47, lon: -80, speed: 30, halfLength: 9, halfWidth: 2.5 },
  ];
  for (let k = 0; k < POINTS; k++) {
    let speed = 20;
    let north = 0;
    for (const s of streaks) {
      const along = (lon[k] - s.lon) / s.halfLength;
      const across = (lat[k] - s.lat) / s.halfWidth;
      const bump = s.speed * Math.exp(-along * along - across * across);
      speed += bump;
      north += -0.15 * bump * along; // a little cross-stream wind, slowing air turning to the right
    }
    u[k] = speed;
    v[k] = north;
    height[k] = 10_400 - 12 * (lat[k] - 40) * (1 + 0.02 * (lat[k] - 40));
    t850[k] = 290 - 0.6 * (lat[k] - 30) + 3 * Math.sin(lon[k] / 6);
    t700[k] = 280 - 0.5 * (lat[k] - 30) + 2 * Math.cos(lon[k] / 7);
  }
  const u850 = u.map((x) => 0.3 * x);
  const v850 = v.map((x, k) => 0.3 * x + 5 * Math.sin(lon[k] / 5));
  return {
    geometry,
    u,
    v,
    height,
    p850: { temperature: t850, u: u850, v: v850 },
    p700: { temperature: t700, u: u.map((x) => 0.5 * x), v: v.map((x) => 0.5 * x) },
  };
}
