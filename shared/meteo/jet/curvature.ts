/**
 * Curvature class of a jet streak from the turning of its traced axis near the core.
 */
import type { HorizontalGrid } from "./horizontal-grid.ts";
import type { JetSettings } from "./jet-settings.ts";
import type { CurvatureClass, JetAxis } from "./jet-types.ts";
import { sampleBilinear } from "./grid-sampling.ts";

const RAD_TO_DEG = 180 / Math.PI;

/**
 * Signed turning (radians, counter-clockwise positive) of the axis tangent between the first and last
 * vertices with |s| ≤ `window`, measured on the Earth's surface: the turn seen in the grid axes plus the
 * turning of the grid axes themselves along the path, κ_g ds = dψ + (−t_x T_x + t_y T_y) ds, with the
 * metric terms T of horizontal-grid.ts (the geodesic curvature of a curve in orthogonal coordinates; on a
 * latitude–longitude grid the extra term is the familiar tan φ / a of a parallel). On an f-plane the
 * extra term is zero.
 */
export function axisTurningAngle(grid: HorizontalGrid, axis: JetAxis, window: number): number {
  let first = -1;
  let last = -1;
  for (let k = 0; k < axis.count; k++) {
    if (Math.abs(axis.s[k]) <= window) {
      if (first < 0) first = k;
      last = k;
    }
  }
  if (first < 0 || last <= first) return 0;
  let turning = 0;
  for (let k = first; k < last; k++) {
    const ax = axis.tangentX[k];
    const ay = axis.tangentY[k];
    const bx = axis.tangentX[k + 1];
    const by = axis.tangentY[k + 1];
    turning += Math.atan2(ax * by - ay * bx, ax * bx + ay * by);
    const midI = 0.5 * (axis.i[k] + axis.i[k + 1]);
    const midJ = 0.5 * (axis.j[k] + axis.j[k + 1]);
    const length = axis.s[k + 1] - axis.s[k];
    const tx = 0.5 * (ax + bx);
    const ty = 0.5 * (ay + by);
    turning += (-tx * sampleBilinear(grid, grid.turnOfX, midI, midJ) + ty * sampleBilinear(grid, grid.turnOfY, midI, midJ)) * length;
  }
  return turning;
}

export interface CurvatureVerdict {
  readonly curvatureClass: CurvatureClass;
  readonly strong: boolean;
  /** Turning (degrees) multiplied by sign(f): positive cyclonic. */
  readonly cyclonicTurningDegrees: number;
}

/**
 * |Δα| below `turnCurvedDegrees` straight; otherwise cyclonic or anticyclonic by the sign of Δα·sign(f);
 * |Δα| ≥ `turnStrongDegrees` is strong. A proposal of the product, not a published classification.
 */
export function classifyCurvature(
  turningRadians: number,
  coriolisSign: number,
  settings: Pick<JetSettings, "turnCurvedDegrees" | "turnStrongDegrees">,
): CurvatureVerdict {
  const cyclonic = turningRadians * RAD_TO_DEG * (coriolisSign < 0 ? -1 : 1);
  const curvatureClass: CurvatureClass = cyclonic >= settings.turnCurvedDegrees ? 1 : cyclonic <= -settings.turnCurvedDegrees ? -1 : 0;
  return { curvatureClass, strong: Math.abs(cyclonic) >= settings.turnStrongDegrees, cyclonicTurningDegrees: cyclonic };
}
