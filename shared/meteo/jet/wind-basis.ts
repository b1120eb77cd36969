/**
 * Wind components in the grid's own axes for differencing, and back to east/north for output.
 * On a projected grid the axes are turned from east/north by θ = n (λ − λ0) (Snyder 1987, eq. 14-4);
 * the rotation is u_g = u_e cos θ − v_e sin θ, v_g = u_e sin θ + v_e cos θ and its inverse. The cosine and
 * sine are cached with the grid metric, so a rotation costs four multiplications per point.
 */
import type { HorizontalGrid } from "./horizontal-grid.ts";

/**
 * Writes (u, v) as grid-axis components into new arrays (or `outU`, `outV`). `relativeToGrid` says which basis the input is in
 * (the geometry's `uvRelativeToGrid`); latitude–longitude and f-plane grids need no rotation.
 */
export function windOnGridAxes(
  grid: HorizontalGrid,
  u: Float32Array,
  v: Float32Array,
  relativeToGrid: boolean,
  outU: Float32Array = new Float32Array(u.length),
  outV: Float32Array = new Float32Array(v.length),
): { u: Float32Array; v: Float32Array } {
  const c = grid.rotationCos;
  const s = grid.rotationSin;
  if (relativeToGrid || !c || !s) {
    outU.set(u);
    outV.set(v);
    return { u: outU, v: outV };
  }
  for (let k = 0; k < outU.length; k++) {
    const ue = u[k];
    const ve = v[k];
    outU[k] = ue * c[k] - ve * s[k];
    outV[k] = ue * s[k] + ve * c[k];
  }
  return { u: outU, v: outV };
}

/** Grid-axis components → east/north, in place: u_e = u_g cos θ + v_g sin θ, v_e = −u_g sin θ + v_g cos θ. */
export function rotateToEarthInPlace(grid: HorizontalGrid, u: Float32Array, v: Float32Array): void {
  const c = grid.rotationCos;
  const s = grid.rotationSin;
  if (!c || !s) return;
  for (let k = 0; k < u.length; k++) {
    const ug = u[k];
    const vg = v[k];
    u[k] = ug * c[k] + vg * s[k];
    v[k] = -ug * s[k] + vg * c[k];
  }
}
