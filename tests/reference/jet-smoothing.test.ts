import { describe, expect, it } from "vitest";
import type { LatLonGeometry } from "../../shared/grid/geometry-types.ts";
import { horizontalGridFor, type FPlaneGeometry } from "../../shared/meteo/jet/horizontal-grid.ts";
import { gaussianSmooth } from "../../shared/meteo/jet/smoothing.ts";

const DEG = Math.PI / 180;

function fPlane(nx: number, ny: number, dx: number): FPlaneGeometry {
  return { kind: "fplane", nx, ny, dx, dy: dx, coriolis: 1e-4, uvRelativeToGrid: true };
}

/** Amplitude of a cosine of wavenumber k (rad per grid step) along a row, by projection onto the cosine. */
function amplitudeAlongRow(field: Float32Array, nx: number, row: number, k: number, from: number, to: number): number {
  let dot = 0;
  let norm = 0;
  for (let i = from; i < to; i++) {
    const c = Math.cos(k * i);
    dot += field[row * nx + i] * c;
    norm += c * c;
  }
  return dot / norm;
}

describe("Gaussian smoother response", () => {
  // A Gaussian of standard deviation σ multiplies a wave of wavenumber k by exp(−k²σ²/2).
  const nx = 600;
  const ny = 9;
  const dx = 25_000;
  const wavelength = 600_000;
  const kStep = (2 * Math.PI * dx) / wavelength;
  const wave = new Float32Array(nx * ny);
  for (let j = 0; j < ny; j++) for (let i = 0; i < nx; i++) wave[j * nx + i] = Math.cos(kStep * i);
  const grid = horizontalGridFor(fPlane(nx, ny, dx));

  it.each([
    ["direct kernel (σ = 3 grid steps)", 75_000, 1e-3],
    ["recursive filter (σ = 8 grid steps)", 200_000, 2e-3],
  ])("%s damps a 600 km wave by exp(−k²σ²/2)", (_name, sigma, tolerance) => {
    const smoothed = gaussianSmooth(grid, wave, sigma);
    const kPhysical = (2 * Math.PI) / wavelength;
    const expected = Math.exp(-0.5 * kPhysical * kPhysical * sigma * sigma);
    // Away from the ends, where the repeated edge value changes the answer.
    const measured = amplitudeAlongRow(smoothed, nx, 4, kStep, 150, 450);
    // Source: Derived in closed form (Fourier transform of a Gaussian)
    expect(Math.abs(measured - expected)).toBeLessThan(tolerance);
  });

  it.each([
    ["direct kernel", 75_000, 1e-3],
    ["recursive filter", 200_000, 2e-3],
  ])("smooths down the columns the same way (%s)", (_name, sigma, tolerance) => {
    // The same wave laid along j on a transposed grid exercises the column pass.
    const columns = horizontalGridFor(fPlane(ny, nx, dx));
    const transposed = new Float32Array(nx * ny);
    for (let j = 0; j < nx; j++) for (let i = 0; i < ny; i++) transposed[j * ny + i] = Math.cos(kStep * j);
    const smoothed = gaussianSmooth(columns, transposed, sigma);
    const column = new Float32Array(nx);
    for (let j = 0; j < nx; j++) column[j] = smoothed[j * ny + 4];
    const kPhysical = (2 * Math.PI) / wavelength;
    const expected = Math.exp(-0.5 * kPhysical * kPhysical * sigma * sigma);
    // Source: Derived in closed form (Fourier transform of a Gaussian)
    expect(Math.abs(amplitudeAlongRow(column, nx, 0, kStep, 150, 450) - expected)).toBeLessThan(tolerance);
  });

  it.each([75_000, 300_000])("leaves a constant field unchanged (σ = %s m)", (sigma) => {
    const constant = new Float32Array(nx * ny).fill(42);
    const smoothed = gaussianSmooth(grid, constant, sigma);
    // Source: Derived in closed form (the kernel has unit sum; edges repeat the boundary value)
    for (let k = 0; k < smoothed.length; k += 97) expect(smoothed[k]).toBeCloseTo(42, 4);
  });

  it.each([75_000, 300_000])("keeps a linear ramp exactly linear, up to the grid edge (σ = %s m)", (sigma) => {
    const ramp = new Float32Array(nx * ny);
    for (let j = 0; j < ny; j++) for (let i = 0; i < nx; i++) ramp[j * nx + i] = 0.01 * i - 0.5 * j;
    const smoothed = gaussianSmooth(grid, ramp, sigma);
    // Source: Derived in closed form (a symmetric kernel leaves linear functions unchanged; point reflection
    // beyond the edge continues the line)
    for (const k of [0, 1, nx - 1, 4 * nx + 300, (ny - 1) * nx + nx - 1]) expect(smoothed[k]).toBeCloseTo(ramp[k], 3);
  });

  it("keeps missing points missing and fills their neighbours from valid points only", () => {
    const holey = new Float32Array(nx * ny).fill(10);
    holey[4 * nx + 300] = Number.NaN;
    const smoothed = gaussianSmooth(grid, holey, 75_000);
    // Common practice (no source): normalised convolution around missing data.
    expect(Number.isNaN(smoothed[4 * nx + 300])).toBe(true);
    expect(smoothed[4 * nx + 301]).toBeCloseTo(10, 4);
  });
});

describe("smoothing on a latitude–longitude grid uses the local east–west spacing", () => {
  it("damps the same physical wave equally at 20° and 60° latitude", () => {
    const geometry: LatLonGeometry = {
      kind: "latlon",
      nx: 720,
      ny: 5,
      earthRadius: 6_371_229,
      uvRelativeToGrid: false,
      lat0: 20,
      lon0: 0,
      dlat: 10,
      dlon: 0.25,
    };
    const grid = horizontalGridFor(geometry);
    const wavelength = 800_000;
    const sigma = 150_000;
    const field = new Float32Array(geometry.nx * geometry.ny);
    const rowsToCheck = [0, 4]; // 20°N and 60°N
    for (let j = 0; j < geometry.ny; j++) {
      const dxRow = geometry.earthRadius * Math.cos((geometry.lat0 + j * geometry.dlat) * DEG) * geometry.dlon * DEG;
      for (let i = 0; i < geometry.nx; i++) field[j * geometry.nx + i] = Math.cos((2 * Math.PI * i * dxRow) / wavelength);
    }
    const smoothed = gaussianSmooth(grid, field, sigma);
    const kPhysical = (2 * Math.PI) / wavelength;
    const expected = Math.exp(-0.5 * kPhysical * kPhysical * sigma * sigma);
    for (const j of rowsToCheck) {
      const dxRow = geometry.earthRadius * Math.cos((geometry.lat0 + j * geometry.dlat) * DEG) * geometry.dlon * DEG;
      const kStep = (2 * Math.PI * dxRow) / wavelength;
      const measured = amplitudeAlongRow(smoothed, geometry.nx, j, kStep, 200, 520);
      // Source: Derived in closed form (Fourier transform of a Gaussian with σ in physical metres)
      expect(Math.abs(measured - expected)).toBeLessThan(2e-3);
    }
  });
});
