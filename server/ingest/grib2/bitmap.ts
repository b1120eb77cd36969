import { Grib2DecodeError, type Grib2ErrorLocation } from "./errors.ts";
import type { FieldSections } from "./sections.ts";

/** Bits set per byte value, to count present points without a loop over bits. */
const BITS_SET = new Uint8Array(256);
for (let b = 1; b < 256; b++) BITS_SET[b] = (b & 1) + BITS_SET[b >>> 1];

export interface Bitmap {
  /** One bit per grid point in scanning order, 1 = value present (WMO-No. 306, section 6). */
  bits: Uint8Array;
  presentCount: number;
}

/**
 * Section 6: indicator 0 = a bitmap follows, 254 = the last bitmap defined in this message applies, 255 = none.
 * Predefined bitmaps (1-253) are not supported.
 */
export function readBitmap(bytes: Uint8Array, field: FieldSections, pointCount: number): Bitmap | null {
  const span = field.bitmap;
  const where: Grib2ErrorLocation = { messageNumber: field.messageNumber, section: 6, byteOffset: span.offset + 5 };
  const indicator = bytes[span.offset + 5];
  if (indicator === 255) return null;
  let source = span;
  if (indicator === 254) {
    if (field.previousBitmap === null) {
      throw new Grib2DecodeError(where, "bitmap indicator 254 (use the previous bitmap) but no earlier field in this message defined one");
    }
    source = field.previousBitmap;
  } else if (indicator !== 0) {
    throw new Grib2DecodeError(where, `bitmap indicator ${indicator} names a predefined bitmap, which is not supported`);
  }
  const needed = Math.ceil(pointCount / 8);
  const available = source.length - 6;
  if (available < needed) {
    throw new Grib2DecodeError(
      { ...where, byteOffset: source.offset },
      `bitmap for ${pointCount} points needs ${needed} bytes but section 6 holds ${available}`,
    );
  }
  const bits = bytes.subarray(source.offset + 6, source.offset + 6 + needed);
  return { bits, presentCount: countPresent(bits, pointCount) };
}

function countPresent(bits: Uint8Array, pointCount: number): number {
  const whole = pointCount >>> 3;
  let count = 0;
  for (let b = 0; b < whole; b++) count += BITS_SET[bits[b]];
  const rest = pointCount & 7;
  if (rest > 0) count += BITS_SET[bits[whole] & ((0xff << (8 - rest)) & 0xff)];
  return count;
}

/** Spreads packed values over the grid in scanning order; points the bitmap marks absent become NaN. */
export function expandWithBitmap(packed: Float32Array, bitmap: Bitmap, out: Float32Array): void {
  const bits = bitmap.bits;
  let next = 0;
  for (let k = 0; k < out.length; k++) {
    out[k] = bits[k >>> 3] & (0x80 >>> (k & 7)) ? packed[next++] : Number.NaN;
  }
}
