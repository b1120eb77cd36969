import { describe, expect, it } from "vitest";
import { horizontalGridFor } from "../../../shared/meteo/jet/horizontal-grid.ts";
import { findJetCores } from "../../../shared/meteo/jet/cores.ts";
import { resolveJetSettings } from "../../../shared/meteo/jet/jet-settings.ts";
import { computeJetFields } from "../../../shared/meteo/jet/compute-jet-fields.ts";
import { QUADRANT } from "../../../shared/meteo/jet/labels.ts";
import { indexNearest, planeGrid, type PlaneGrid } from "../../helpers/jet-test-fields.ts";

const settings = resolveJetSettings();

function field(grid: PlaneGrid, fn: (x: number, y: number) => number): Float32Array {
  const { nx, ny } = grid.geometry;
  const out = new Float32Array(nx * ny);
  for (let j = 0; j < ny; j++) for (let i = 0; i < nx; i++) out[j * nx + i] = fn(grid.x[i], grid.y[j]);
  return out;
}

const bump = (x: number, y: number, x0: number, length: number, width: number) => Math.exp(-(((x - x0) / length) ** 2) - (y / width) ** 2);

describe("jet cores", () => {
  const grid = planeGrid({ dx: 25_000, xMin: -2e6, xMax: 2e6, yMin: -1e6, yMax: 1e6, f: 1e-4 });
  const metric = horizontalGridFor(grid.geometry);
  // A broad fast plateau (52 m/s) with two maxima 1600 km apart.
  const twoPeaks = (second: number) => field(grid, (x, y) => 52 * bump(0, y, 0, 1e9, 400e3) + 10 * bump(x, y, -800e3, 300e3, 300e3) + second * bump(x, y, 800e3, 300e3, 300e3));

  // Derived in closed form for every expectation below: peaks of 52 + 10 and 52 + 8 (or + 3) m/s at x = ∓800 km,
  // joined along y = 0 by the 52 m/s plateau (the saddle), so the lower peak stands 8 (or 3) m/s above it.
  it("keeps two maxima of one fast region apart when the lower stands ≥ 5 m/s above the saddle", () => {
    const cores = findJetCores(metric, twoPeaks(8), settings);
    expect(cores).toHaveLength(2);
    expect(cores[0].speed).toBeCloseTo(62, 0);
    expect(grid.x[Math.round(cores[0].i)]).toBeCloseTo(-800e3, -4);
    expect(grid.x[Math.round(cores[1].i)]).toBeCloseTo(800e3, -4);
  });

  it("merges a maximum standing less than 5 m/s above the saddle into its neighbour", () => {
    expect(findJetCores(metric, twoPeaks(3), settings)).toHaveLength(1);
  });

  // Derived in closed form: maxima 400 km apart, inside the 600 km separation but outside 300 km.
  it("merges maxima closer than the core separation", () => {
    const close = field(grid, (x, y) => 40 + 20 * bump(x, y, -200e3, 150e3, 300e3) + 18 * bump(x, y, 200e3, 150e3, 300e3));
    expect(findJetCores(metric, close, settings)).toHaveLength(1);
    expect(findJetCores(metric, close, { ...settings, coreSeparation: 300e3 })).toHaveLength(2);
  });

  it("ignores fast regions smaller than three cells", () => {
    const speck = field(grid, () => 40);
    speck[40 * grid.geometry.nx + 80] = 60;
    expect(findJetCores(metric, speck, settings)).toHaveLength(0);
  });

  it("refines the core position between grid points", () => {
    const offCentre = field(grid, (x, y) => 20 + 40 * bump(x, y, 10e3, 600e3, 300e3));
    const [core] = findJetCores(metric, offCentre, settings);
    // Derived in closed form: the maximum lies 10 km (0.4 grid lengths) east of the centre point.
    expect(grid.x[0] + core.i * 25e3).toBeCloseTo(10e3, -3);
  });
});

describe.each([
  // Two 65 m/s maxima joined by a saddle fast enough to trace through (≥ 30 m/s) but too slow to make one core:
  // 1800 km apart (the axes overlap without reaching the other core) and 1200 km apart (each axis runs through
  // the other core).
  { half: 900e3, length: 700e3 },
  { half: 600e3, length: 500e3 },
])("two cores on one jet axis, ±$half m", ({ half, length }) => {
  const grid = planeGrid({ dx: 25_000, xMin: -3e6, xMax: 3e6, yMin: -1.5e6, yMax: 1.5e6, f: 1e-4 });
  const u = field(grid, (x, y) => 20 + 45 * (bump(x, y, -half, length, 300e3) + bump(x, y, half, length, 300e3)));
  const v = new Float32Array(u.length);
  const result = computeJetFields({ geometry: grid.geometry, u, v, height: new Float32Array(u.length) });
  const at = (x: number, y: number) => indexNearest(grid, x, y);

  it("finds both cores and cuts the shared axis at the speed minimum between them", () => {
    expect(result.streaks).toHaveLength(2);
    const [upstream, downstream] = [...result.streaks].sort((a, b) => a.core.i - b.core.i);
    const lastUpstreamX = grid.x[0] + upstream.axis.at(-1)!.i * 25e3;
    const firstDownstreamX = grid.x[0] + downstream.axis[0].i * 25e3;
    // Derived in closed form: the field is symmetric, so the speed minimum is at x = 0.
    expect(Math.abs(lastUpstreamX)).toBeLessThan(60e3);
    expect(Math.abs(firstDownstreamX)).toBeLessThan(60e3);
  });

  it("labels points either side of the cut as exit of the first core and entrance of the second", () => {
    expect(result.fields.jet_quadrant[at(-150e3, 150e3)]).toBe(QUADRANT.leftExit);
    expect(result.fields.jet_quadrant[at(150e3, 150e3)]).toBe(QUADRANT.leftEntrance);
    // Derived in closed form: those points lie about `half` − 150 km from their cores along the axis.
    expect(result.fields.jet_along_dist[at(-150e3, 150e3)]).toBeCloseTo(half - 150e3, -5);
    expect(result.fields.jet_along_dist[at(150e3, 150e3)]).toBeCloseTo(-(half - 150e3), -5);
  });

  it("leaves points beyond the far end of an axis unlabelled", () => {
    expect(result.fields.jet_quadrant[at(half + 500e3, 100e3)]).toBe(QUADRANT.leftExit);
    // Derived in closed form: on the axis S = 20 + 45 e^{−((x − half)/length)²} falls below 30 m/s (where tracing
    // stops) at |x| = half + length √ln 4.5; 250 km further out is still within reach of the end vertex.
    const end = half + length * Math.sqrt(Math.log(4.5));
    expect(result.fields.jet_quadrant[at(end - 250e3, 100e3)]).toBe(QUADRANT.leftExit);
    expect(result.fields.jet_quadrant[at(end + 250e3, 0)]).toBe(QUADRANT.none);
    expect(result.fields.jet_quadrant[at(-end - 250e3, 0)]).toBe(QUADRANT.none);
  });
});

describe("two parallel jets", () => {
  const grid = planeGrid({ dx: 25_000, xMin: -2.5e6, xMax: 2.5e6, yMin: -1.5e6, yMax: 1.5e6, f: 1e-4 });
  const u = field(grid, (x, y) => 20 + 40 * Math.exp(-((x / 1e6) ** 2)) * (Math.exp(-(((y - 500e3) / 200e3) ** 2)) + Math.exp(-(((y + 500e3) / 200e3) ** 2))));
  const result = computeJetFields({ geometry: grid.geometry, u, v: new Float32Array(u.length), height: new Float32Array(u.length) });

  // Derived in closed form: axes along y = ±500 km; the probes lie 100 km inside each.
  it("gives each point to the nearer axis", () => {
    expect(result.streaks).toHaveLength(2);
    // 100 km north of the southern jet's axis: left of the southern jet, not right of the northern one.
    expect(result.fields.jet_quadrant[indexNearest(grid, 400e3, -400e3)]).toBe(QUADRANT.leftExit);
    expect(result.fields.jet_quadrant[indexNearest(grid, 400e3, 400e3)]).toBe(QUADRANT.rightExit);
    expect(result.fields.jet_axis_dist[indexNearest(grid, 400e3, -400e3)]).toBeCloseTo(100e3, -4);
  });
});
