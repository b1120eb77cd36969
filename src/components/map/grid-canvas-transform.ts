import type { GridGeometry } from "@shared/grid/geometry-types.ts";

/**
 * Mapping between grid indices and canvas pixels. The grid is regular in its own projection plane,
 * so the map is the grid's rectangle scaled: every cell becomes an equal block of pixels, with
 * i growing to the right and j growing upward (north at the top).
 *
 * Cell (i, j) covers x ∈ [i·w, (i+1)·w) and y ∈ [(ny−1−j)·h, (ny−j)·h); its centre, where the
 * value applies, sits at fractional grid point (i, j).
 */
export interface GridCanvasTransform {
  readonly nx: number;
  readonly ny: number;
  /** Canvas size in CSS pixels. */
  readonly width: number;
  readonly height: number;
  /** Size of one grid cell in CSS pixels. */
  readonly cellWidth: number;
  readonly cellHeight: number;
}

export interface XY {
  x: number;
  y: number;
}

export interface IJ {
  i: number;
  j: number;
}

/**
 * Width ÷ height of one cell in the projection plane: dx ÷ dy for projected grids; for
 * latitude–longitude grids, degrees of longitude shrink with cos(latitude) at the grid's middle.
 */
export function cellAspect(geometry: GridGeometry): number {
  if (geometry.kind === "latlon") {
    const middleLat = geometry.lat0 + ((geometry.ny - 1) * geometry.dlat) / 2;
    // Kept above a floor so a grid reaching a pole still gets a drawable width.
    return (geometry.dlon * Math.max(0.05, Math.cos((middleLat * Math.PI) / 180))) / geometry.dlat;
  }
  return geometry.dx / geometry.dy;
}

/** The largest canvas of the grid's shape that fits in maxWidth × maxHeight (CSS pixels). */
export function fitGridToBox(nx: number, ny: number, aspect: number, maxWidth: number, maxHeight: number): GridCanvasTransform {
  const gridRatio = (nx * aspect) / ny;
  let width = Math.max(1, maxWidth);
  let height = width / gridRatio;
  if (height > maxHeight && maxHeight > 0) {
    height = maxHeight;
    width = height * gridRatio;
  }
  return { nx, ny, width, height, cellWidth: width / nx, cellHeight: height / ny };
}

/** Fractional grid point → canvas position (CSS pixels); writes into `out`. */
export function gridToCanvas(t: GridCanvasTransform, i: number, j: number, out: XY): XY {
  out.x = (i + 0.5) * t.cellWidth;
  out.y = (t.ny - 0.5 - j) * t.cellHeight;
  return out;
}

/** Canvas position → fractional grid point; writes into `out`. */
export function canvasToGrid(t: GridCanvasTransform, x: number, y: number, out: IJ): IJ {
  out.i = x / t.cellWidth - 0.5;
  out.j = t.ny - 0.5 - y / t.cellHeight;
  return out;
}

/** The cell under a canvas position, or null off the grid. */
export function cellAtCanvas(t: GridCanvasTransform, x: number, y: number): IJ | null {
  const i = Math.floor(x / t.cellWidth);
  const j = t.ny - 1 - Math.floor(y / t.cellHeight);
  if (i < 0 || i >= t.nx || j < 0 || j >= t.ny) return null;
  return { i, j };
}
