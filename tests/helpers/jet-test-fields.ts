/**
 * Analytic wind fields with known answers for the jet diagnostics: a Gaussian jet streak in uniform
 * westerly flow on an f-plane (optionally rotated), a jet streak bent around a circle (cyclonic or, mirrored,
 * anticyclonic), and small helpers to place points. Coordinates are metres from the grid centre.
 */
import type { FPlaneGeometry } from "../../shared/meteo/jet/horizontal-grid.ts";
import { STANDARD_GRAVITY } from "../../shared/meteo/constants.ts";

/** Gaussian jet-streak parameters: uniform flow U0, streak amplitude U1, e-folding lengths Lx, Ly. */
export const STREAK = { U0: 20, U1: 40, Lx: 1_200_000, Ly: 300_000 } as const;

/** Error function, Abramowitz and Stegun (1964), eq. 7.1.26 (absolute error below 1.5 × 10⁻⁷). */
export function erf(x: number): number {
  const sign = x < 0 ? -1 : 1;
  const a = Math.abs(x);
  const t = 1 / (1 + 0.3275911 * a);
  const poly = t * (0.254829592 + t * (-0.284496736 + t * (1.421413741 + t * (-1.453152027 + t * 1.061405429))));
  return sign * (1 - poly * Math.exp(-a * a));
}

export interface PlaneGrid {
  readonly geometry: FPlaneGeometry;
  /** x (m) of column i and y (m) of row j, measured from the grid centre. */
  readonly x: Float64Array;
  readonly y: Float64Array;
}

/** An f-plane grid whose centre is (0, 0); x from −halfWidth to +halfWidth, y from yMin to yMax. */
export function planeGrid(options: { dx: number; xMin: number; xMax: number; yMin: number; yMax: number; f: number }): PlaneGrid {
  const nx = Math.round((options.xMax - options.xMin) / options.dx) + 1;
  const ny = Math.round((options.yMax - options.yMin) / options.dx) + 1;
  const x = Float64Array.from({ length: nx }, (_, i) => options.xMin + i * options.dx);
  const y = Float64Array.from({ length: ny }, (_, j) => options.yMin + j * options.dx);
  return { geometry: { kind: "fplane", nx, ny, dx: options.dx, dy: options.dx, coriolis: options.f, uvRelativeToGrid: true }, x, y };
}

/** The grid index nearest to (x, y) (m). */
export function indexNearest(grid: PlaneGrid, x: number, y: number): number {
  const dx = grid.geometry.dx;
  const i = Math.round((x - grid.x[0]) / dx);
  const j = Math.round((y - grid.y[0]) / dx);
  return j * grid.geometry.nx + i;
}

/** (x, y) of grid index k. */
export function pointOf(grid: PlaneGrid, k: number): { x: number; y: number } {
  const i = k % grid.geometry.nx;
  return { x: grid.x[i], y: grid.y[(k - i) / grid.geometry.nx] };
}

export interface AnalyticJet {
  readonly grid: PlaneGrid;
  readonly u: Float32Array;
  readonly v: Float32Array;
  /** Geostrophic test height Z = (f/g) ψ (gpm), so that V_g is the non-divergent wind. */
  readonly height: Float32Array;
  /** Non-divergent (geostrophic) part of the wind. */
  readonly uNonDivergent: Float32Array;
  readonly vNonDivergent: Float32Array;
  /** Exact divergence (s⁻¹) at every grid point. */
  readonly exactDivergence: Float64Array;
}

/**
 * The Gaussian jet streak: ψ = −U0 y − U1 (√π Ly/2) e^{−x²/Lx²} erf(y/Ly) gives u = U0 + U1 G and the
 * non-divergent v; the cross-stream ageostrophic wind v_ag = (1/f) u ∂u/∂x is added, and
 * δ = (4 U1 x y / (f Lx² Ly²)) G (U0 + 2 U1 G). `rotationDegrees` turns the whole pattern counter-clockwise.
 * Default grid: 25 km, x ∈ [−3000, 3000] km, y ∈ [−2000, 2000] km.
 */
export function gaussianJetStreak(options: { f: number; rotationDegrees?: number; grid?: PlaneGrid }): AnalyticJet {
  const grid = options.grid ?? planeGrid({ dx: 25_000, xMin: -3e6, xMax: 3e6, yMin: -2e6, yMax: 2e6, f: options.f });
  const { U0, U1, Lx, Ly } = STREAK;
  const f = options.f;
  const alpha = ((options.rotationDegrees ?? 0) * Math.PI) / 180;
  const c = Math.cos(alpha);
  const s = Math.sin(alpha);
  const { nx, ny } = grid.geometry;
  const n = nx * ny;
  const u = new Float32Array(n);
  const v = new Float32Array(n);
  const height = new Float32Array(n);
  const uNonDivergent = new Float32Array(n);
  const vNonDivergent = new Float32Array(n);
  const exactDivergence = new Float64Array(n);
  for (let j = 0; j < ny; j++) {
    for (let i = 0; i < nx; i++) {
      const k = j * nx + i;
      // Streak-relative coordinates.
      const xs = grid.x[i] * c + grid.y[j] * s;
      const ys = -grid.x[i] * s + grid.y[j] * c;
      const along = Math.exp(-(xs * xs) / (Lx * Lx));
      const g = along * Math.exp(-(ys * ys) / (Ly * Ly));
      const us = U0 + U1 * g;
      const vnd = ((U1 * Math.sqrt(Math.PI) * Ly * xs) / (Lx * Lx)) * erf(ys / Ly) * along;
      const vag = ((-2 * U1 * xs) / (f * Lx * Lx)) * g * (U0 + U1 * g);
      const psi = -U0 * ys - U1 * ((Math.sqrt(Math.PI) * Ly) / 2) * along * erf(ys / Ly);
      u[k] = us * c - (vnd + vag) * s;
      v[k] = us * s + (vnd + vag) * c;
      uNonDivergent[k] = us * c - vnd * s;
      vNonDivergent[k] = us * s + vnd * c;
      height[k] = (f / STANDARD_GRAVITY) * psi;
      exactDivergence[k] = ((4 * U1 * xs * ys) / (f * Lx * Lx * Ly * Ly)) * g * (U0 + 2 * U1 * g);
    }
  }
  return { grid, u, v, height, uNonDivergent, vNonDivergent, exactDivergence };
}

/** Turns (x, y) counter-clockwise by `degrees` (used to place probe points on a rotated streak). */
export function rotatePoint(x: number, y: number, degrees: number): { x: number; y: number } {
  const a = (degrees * Math.PI) / 180;
  return { x: x * Math.cos(a) - y * Math.sin(a), y: x * Math.sin(a) + y * Math.cos(a) };
}

export interface CurvedJet {
  readonly grid: PlaneGrid;
  readonly u: Float32Array;
  readonly v: Float32Array;
  /** Arc-frame position of a point: arc length from the trough/ridge base and distance inside the bend. */
  readonly place: (arc: number, inward: number) => { x: number; y: number };
}

/**
 * A streak bent round a circle of radius Rc: centre O = (0, Rc) for a cyclonic (counter-clockwise) bend,
 * with arc angle φ = atan2(x, Rc − y), r = |P − O|, S = U0 + U1 exp(−(Rc φ/Lx)² − ((r − Rc)/Ly)²) and the wind
 * along the circle, eastward at the base (0, 0). `mirror` reflects it in y = 0 (a ridge: clockwise bend).
 * The grid (25 km) holds ±1500 km of arc and 500 km either side.
 */
export function curvedJetStreak(options: { radius: number; mirror: boolean; f: number }): CurvedJet {
  const { U0, U1, Lx, Ly } = STREAK;
  const rc = options.radius;
  const flip = options.mirror ? -1 : 1;
  const yNear = -1_000_000;
  const yFar = 2_600_000;
  const grid = planeGrid({
    dx: 25_000,
    xMin: -2_600_000,
    xMax: 2_600_000,
    yMin: options.mirror ? -yFar : yNear,
    yMax: options.mirror ? -yNear : yFar,
    f: options.f,
  });
  const { nx, ny } = grid.geometry;
  const u = new Float32Array(nx * ny);
  const v = new Float32Array(nx * ny);
  for (let j = 0; j < ny; j++) {
    for (let i = 0; i < nx; i++) {
      const x = grid.x[i];
      const y = flip * grid.y[j]; // position in the unmirrored (cyclonic) frame
      const r = Math.hypot(x, rc - y);
      const phi = Math.atan2(x, rc - y);
      const speed = U0 + U1 * Math.exp(-((rc * phi) ** 2) / (Lx * Lx) - ((r - rc) ** 2) / (Ly * Ly));
      const k = j * nx + i;
      u[k] = (speed * (rc - y)) / r;
      v[k] = (flip * speed * x) / r;
    }
  }
  const place = (arc: number, inward: number) => {
    const phi = arc / rc;
    const r = rc - inward;
    return { x: r * Math.sin(phi), y: flip * (rc - r * Math.cos(phi)) };
  };
  return { grid, u, v, place };
}
