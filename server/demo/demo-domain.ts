import type { LambertGeometry } from "../../shared/grid/geometry-types.ts";
import { lambertPlane, planeForward, planeInverse } from "../../shared/grid/conformal-plane.ts";
import { DEFAULT_EARTH_RADIUS_M } from "../../shared/grid/earth-constants.ts";

/**
 * The invented demo office's model domain: a 12-km Lambert conformal grid over a plains region,
 * centred at 36° N, 98° W. Everything placed on it is made up.
 */
export const DEMO_CENTRE = { lat: 36, lon: -98 } as const;
export const DEMO_GRID_SPACING_M = 12_000;
export const DEMO_NX = 100;
export const DEMO_NY = 84;

export function demoGeometry(nx = DEMO_NX, ny = DEMO_NY, spacing = DEMO_GRID_SPACING_M): LambertGeometry {
  const latin = 38.5;
  const lonV = -98;
  const plane = lambertPlane(latin, latin, lonV, DEFAULT_EARTH_RADIUS_M);
  const centre = planeForward(plane, DEMO_CENTRE.lat, DEMO_CENTRE.lon, { x: 0, y: 0 });
  const corner = planeInverse(plane, centre.x - ((nx - 1) / 2) * spacing, centre.y - ((ny - 1) / 2) * spacing, { lat: 0, lon: 0 });
  return {
    kind: "lambert",
    nx,
    ny,
    earthRadius: DEFAULT_EARTH_RADIUS_M,
    uvRelativeToGrid: false,
    lat0: Number(corner.lat.toFixed(6)),
    lon0: Number(corner.lon.toFixed(6)),
    dx: spacing,
    dy: spacing,
    lonV,
    latin1: latin,
    latin2: latin,
  };
}
