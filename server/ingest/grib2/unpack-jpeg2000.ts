import { loadedOpenJpeg } from "./codecs.ts";
import type { PackingScale } from "./data-representation.ts";
import { Grib2PayloadError } from "./errors.ts";
import { fillConstant, linearScale } from "./packing-scale.ts";

/**
 * Template 5.40: the packed integers are one greyscale JPEG 2000 code stream (ISO/IEC 15444-1), decoded by the
 * OpenJPEG WebAssembly build, then scaled like simple packing.
 */
export function unpackJpeg2000(payload: Uint8Array, scale: PackingScale, out: Float32Array): void {
  if (scale.bitsPerValue === 0 || scale.valueCount === 0) {
    fillConstant(scale, out);
    return;
  }
  const codec = loadedOpenJpeg();
  if (codec === null) {
    throw new Grib2PayloadError("JPEG 2000 data (template 5.40) needs the codec: await loadGrib2Codecs() before decoding");
  }
  const decoder = new codec.J2KDecoder();
  try {
    decoder.getEncodedBuffer(payload.length).set(payload);
    try {
      decoder.decode();
    } catch (error) {
      throw new Grib2PayloadError(`JPEG 2000 code stream could not be decoded: ${String(error)}`);
    }
    const info = decoder.getFrameInfo();
    const pixels = info.width * info.height;
    if (info.componentCount !== 1) throw new Grib2PayloadError(`JPEG 2000 image has ${info.componentCount} components; GRIB2 uses one`);
    if (pixels !== scale.valueCount) {
      throw new Grib2PayloadError(`JPEG 2000 image is ${info.width} x ${info.height} = ${pixels} pixels but section 5 declares ${scale.valueCount} values`);
    }
    if (info.bitsPerSample > 16) throw new Grib2PayloadError(`JPEG 2000 samples of ${info.bitsPerSample} bits are wider than this codec returns (16)`);
    const decoded = decoder.getDecodedBuffer();
    const { offset, factor } = linearScale(scale);
    // The codec hands back 8-bit samples as bytes and wider ones as little-endian 16-bit words.
    if (info.bitsPerSample <= 8) {
      for (let p = 0; p < pixels; p++) out[p] = offset + (info.isSigned ? (decoded[p] << 24) >> 24 : decoded[p]) * factor;
    } else {
      for (let p = 0; p < pixels; p++) {
        const word = decoded[2 * p] | (decoded[2 * p + 1] << 8);
        out[p] = offset + (info.isSigned ? (word << 16) >> 16 : word) * factor;
      }
    }
  } finally {
    decoder.delete();
  }
}
