import type { GridGeometry } from "@shared/grid/geometry-types.ts";
import { projectionForGeometry } from "@shared/grid/projection.ts";
import { rotationAngle } from "@shared/grid/wind-rotation.ts";
import { gridToCanvas, type GridCanvasTransform } from "@/components/map/index.ts";

/**
 * Where the ageostrophic-wind arrows go and which way they point on the map. The stored components
 * (`jet_uag`, `jet_vag`) are east and north; on a projected grid they are first turned to the grid's
 * own axes (Snyder 1987, eq. 14-4: θ = n (λ − λ0)), then to screen pixels, where i runs right and j
 * runs up. Arrows are thinned to one per few cells so they stay apart on screen whatever the grid's
 * resolution.
 */

/** Target distance between neighbouring arrows (CSS pixels). */
export const ARROW_SPACING_PX = 34;

export interface ArrowSamples {
  count: number;
  /** Canvas position of each sampled grid point (CSS pixels); the arrow is centred there. */
  x: Float32Array;
  y: Float32Array;
  /** Unit direction of the wind on screen (y grows downward). */
  dirX: Float32Array;
  dirY: Float32Array;
  /** Ageostrophic speed (m/s). */
  speed: Float32Array;
  /** Grid cells between samples along i and along j. */
  strideI: number;
  strideJ: number;
}

/** Cells between samples so that neighbouring arrows are about `spacingPx` apart (at least every cell). */
export function thinningStride(cellSizePx: number, spacingPx: number): number {
  return Math.max(1, Math.round(spacingPx / Math.max(cellSizePx, 1e-6)));
}

/** First sampled index along a line of `n` points, so the samples sit centred on the grid. */
export function firstSample(n: number, stride: number): number {
  return Math.floor(((n - 1) % stride) / 2);
}

/**
 * Screen pixels per unit step along the Earth's east and north at a point, up to a common factor: on a
 * conformal grid the map factor is the same both ways and drops out of a direction; on a
 * latitude–longitude grid one degree of longitude spans cos φ of a degree of latitude.
 */
function screenStretch(geometry: GridGeometry, transform: GridCanvasTransform, latDeg: number, out: { x: number; y: number }) {
  if (geometry.kind === "latlon") {
    out.x = transform.cellWidth / (geometry.dlon * Math.max(1e-6, Math.cos((latDeg * Math.PI) / 180)));
    out.y = transform.cellHeight / geometry.dlat;
  } else {
    out.x = transform.cellWidth / geometry.dx;
    out.y = transform.cellHeight / geometry.dy;
  }
  return out;
}

/** Thinned arrows of an Earth-relative wind (u east, v north; m/s) on the map; points without a value are left out. */
export function ageostrophicArrows(
  uEast: Float32Array,
  vNorth: Float32Array,
  geometry: GridGeometry,
  transform: GridCanvasTransform,
  spacingPx = ARROW_SPACING_PX,
): ArrowSamples {
  const { nx, ny } = geometry;
  if (uEast.length !== nx * ny || vNorth.length !== nx * ny) {
    throw new RangeError(`ageostrophicArrows: ${uEast.length} and ${vNorth.length} values for a ${nx} × ${ny} grid`);
  }
  const strideI = thinningStride(transform.cellWidth, spacingPx);
  const strideJ = thinningStride(transform.cellHeight, spacingPx);
  const i0 = firstSample(nx, strideI);
  const j0 = firstSample(ny, strideJ);
  const capacity = Math.ceil((nx - i0) / strideI) * Math.ceil((ny - j0) / strideJ);
  const samples: ArrowSamples = {
    count: 0,
    x: new Float32Array(capacity),
    y: new Float32Array(capacity),
    dirX: new Float32Array(capacity),
    dirY: new Float32Array(capacity),
    speed: new Float32Array(capacity),
    strideI,
    strideJ,
  };
  const projection = projectionForGeometry(geometry);
  const place = { x: 0, y: 0 };
  const where = { lat: 0, lon: 0 };
  const stretch = { x: 0, y: 0 };
  let count = 0;
  for (let j = j0; j < ny; j += strideJ) {
    for (let i = i0; i < nx; i += strideI) {
      const k = j * nx + i;
      const ue = uEast[k]!;
      const ve = vNorth[k]!;
      if (ue !== ue || ve !== ve) continue;
      projection.gridToLatLon(i, j, where);
      // Earth-relative → grid-relative, the same turn as rotateEarthToGrid (shared/grid/wind-rotation.ts).
      const theta = rotationAngle(geometry, where.lon);
      const c = Math.cos(theta);
      const s = Math.sin(theta);
      const ug = ue * c - ve * s;
      const vg = ue * s + ve * c;
      screenStretch(geometry, transform, where.lat, stretch);
      const sx = ug * stretch.x;
      const sy = -vg * stretch.y;
      const length = Math.hypot(sx, sy);
      gridToCanvas(transform, i, j, place);
      samples.x[count] = place.x;
      samples.y[count] = place.y;
      samples.dirX[count] = length > 0 ? sx / length : 0;
      samples.dirY[count] = length > 0 ? sy / length : 0;
      samples.speed[count] = Math.hypot(ue, ve);
      count++;
    }
  }
  samples.count = count;
  return samples;
}
