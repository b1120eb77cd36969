/**
 * Paints a 0/1 grid mask into RGBA pixels, one pixel per grid cell, in the same layout as
 * paintField (image row ny − 1 − j holds grid row j): cells set in the mask get `colour`, all
 * others stay transparent. One pass, no allocation.
 */
export function paintMask(mask: Uint8Array, nx: number, ny: number, colour: readonly [number, number, number, number], out: Uint8ClampedArray): void {
  if (mask.length !== nx * ny) throw new Error(`paintMask: ${mask.length} mask values for a ${nx} × ${ny} grid`);
  if (out.length !== nx * ny * 4) throw new Error(`paintMask: the pixel buffer holds ${out.length / 4} pixels, the grid ${nx * ny}`);
  const [r, g, b, a] = colour;
  for (let j = 0; j < ny; j++) {
    const rowStart = (ny - 1 - j) * nx * 4;
    for (let i = 0; i < nx; i++) {
      const p = rowStart + i * 4;
      const on = mask[j * nx + i] !== 0;
      out[p] = on ? r : 0;
      out[p + 1] = on ? g : 0;
      out[p + 2] = on ? b : 0;
      out[p + 3] = on ? a : 0;
    }
  }
}

/** Number of cells set in a mask. */
export function maskCount(mask: Uint8Array): number {
  let count = 0;
  for (let k = 0; k < mask.length; k++) if (mask[k] !== 0) count++;
  return count;
}
