import { BitReader } from "./bit-reader.ts";
import type { PackingScale } from "./data-representation.ts";
import { Grib2PayloadError } from "./errors.ts";
import { fillConstant, linearScale } from "./packing-scale.ts";

/** Template 5.0 / 7.0: valueCount integers of bitsPerValue bits back to back, then scaled. */
export function unpackSimple(payload: Uint8Array, scale: PackingScale, out: Float32Array): void {
  const n = scale.valueCount;
  const bits = scale.bitsPerValue;
  if (bits === 0) {
    fillConstant(scale, out);
    return;
  }
  const needed = Math.ceil((n * bits) / 8);
  if (payload.length < needed) {
    throw new Grib2PayloadError(`${n} values of ${bits} bits need ${needed} bytes of data but section 7 holds ${payload.length}`);
  }
  const { offset, factor } = linearScale(scale);
  if (bits === 8 || bits === 16 || bits === 24 || bits === 32) {
    unpackWholeBytes(payload, bits >>> 3, n, offset, factor, out);
    return;
  }
  const reader = new BitReader(payload);
  for (let k = 0; k < n; k++) out[k] = offset + reader.read(bits) * factor;
}

/** Byte-aligned widths are common (16 bits above all) and need no bit arithmetic. */
function unpackWholeBytes(payload: Uint8Array, width: number, n: number, offset: number, factor: number, out: Float32Array): void {
  let p = 0;
  for (let k = 0; k < n; k++) {
    let x = 0;
    for (let b = 0; b < width; b++) x = x * 256 + payload[p + b];
    p += width;
    out[k] = offset + x * factor;
  }
}
