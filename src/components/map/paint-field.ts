import { RAMP_STEPS, type ColourScale } from "./colour-scale.ts";

/**
 * Colours a field into RGBA pixels, one pixel per grid cell, ready for an nx × ny ImageData.
 * Image rows run north to south while grid rows run south to north (j = 0 is the southern edge),
 * so grid row j lands in image row ny − 1 − j. NaN (no value) stays fully transparent.
 * One pass, no allocation: the colour comes from the scale's lookup table.
 */
export function paintField(values: Float32Array, nx: number, ny: number, scale: ColourScale, out: Uint8ClampedArray): void {
  if (values.length !== nx * ny) throw new Error(`paintField: ${values.length} values for a ${nx} × ${ny} grid`);
  if (out.length !== nx * ny * 4) throw new Error(`paintField: the pixel buffer holds ${out.length / 4} pixels, the grid ${nx * ny}`);
  const lut = scale.lut;
  const isRamp = scale.kind !== "categorical";
  const lo = isRamp ? scale.domain[0] : 0;
  const span = isRamp ? scale.domain[1] - scale.domain[0] : 1;
  const lastStep = RAMP_STEPS - 1;
  const minCode = isRamp ? 0 : scale.minCode;
  const codeCount = lut.length / 4;

  for (let j = 0; j < ny; j++) {
    const rowStart = (ny - 1 - j) * nx * 4;
    for (let i = 0; i < nx; i++) {
      const value = values[j * nx + i]!;
      const p = rowStart + i * 4;
      let entry = -1;
      if (value === value) {
        if (isRamp) {
          const t = (value - lo) / span;
          entry = t <= 0 ? 0 : t >= 1 ? lastStep : Math.round(t * lastStep);
        } else {
          const code = Math.round(value) - minCode;
          if (code >= 0 && code < codeCount) entry = code;
        }
      }
      if (entry < 0) {
        out[p] = 0;
        out[p + 1] = 0;
        out[p + 2] = 0;
        out[p + 3] = 0;
      } else {
        const q = entry * 4;
        out[p] = lut[q]!;
        out[p + 1] = lut[q + 1]!;
        out[p + 2] = lut[q + 2]!;
        out[p + 3] = lut[q + 3]!;
      }
    }
  }
}
