/**
 * Copies one (time, level) slice of a variable, in whatever dimension order and direction the
 * file uses, into Bellwether's canonical layout (index = j * nx + i, i eastward, j northward),
 * applying the CF value transform on the way. One pass, no per-point allocation.
 */
import type { NumericArray } from "./raw-dataset.ts";
import type { ValueTransform } from "./cf-packing.ts";

export interface SliceLayout {
  /** Row-major strides of the variable's values, one per dimension. */
  strides: readonly number[];
  xAxis: number;
  yAxis: number;
  /** Axis index of time / level, or -1 when the variable has none. */
  timeAxis: number;
  levelAxis: number;
  nx: number;
  ny: number;
  flipX: boolean;
  flipY: boolean;
}

export function rowMajorStrides(shape: readonly number[]): number[] {
  const strides = new Array<number>(shape.length);
  let stride = 1;
  for (let axis = shape.length - 1; axis >= 0; axis--) {
    strides[axis] = stride;
    stride *= shape[axis];
  }
  return strides;
}

/** Fills `out` (length nx * ny) with slice (timeIndex, levelIndex); returns how many values are missing. */
export function extractCanonicalSlice(
  values: NumericArray,
  layout: SliceLayout,
  timeIndex: number,
  levelIndex: number,
  transform: ValueTransform,
  out: Float32Array,
): number {
  const { strides, nx, ny } = layout;
  let base = 0;
  if (layout.timeAxis >= 0) base += timeIndex * strides[layout.timeAxis];
  if (layout.levelAxis >= 0) base += levelIndex * strides[layout.levelAxis];
  const xStride = layout.flipX ? -strides[layout.xAxis] : strides[layout.xAxis];
  const xStart = layout.flipX ? (nx - 1) * strides[layout.xAxis] : 0;
  const { fills, validMin, validMax, scale, offset } = transform;
  const fillCount = fills.length;
  let missing = 0;
  for (let j = 0; j < ny; j++) {
    const fileRow = layout.flipY ? ny - 1 - j : j;
    let source = base + fileRow * strides[layout.yAxis] + xStart;
    const rowStart = j * nx;
    for (let i = 0; i < nx; i++, source += xStride) {
      const raw = values[source];
      let isMissing = raw !== raw || raw < validMin || raw > validMax;
      for (let f = 0; f < fillCount && !isMissing; f++) isMissing = raw === fills[f];
      if (isMissing) {
        out[rowStart + i] = NaN;
        missing++;
      } else {
        out[rowStart + i] = raw * scale + offset;
      }
    }
  }
  return missing;
}
