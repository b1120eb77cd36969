import { decode as decodePng } from "fast-png";
import { BitReader } from "./bit-reader.ts";
import type { PackingScale } from "./data-representation.ts";
import { Grib2PayloadError } from "./errors.ts";
import { fillConstant, linearScale } from "./packing-scale.ts";

/**
 * Template 5.41: the packed integers are the pixels of a PNG image, read row by row. GRIB2 maps 1-16 bit widths
 * to greyscale of that depth, 24 bits to RGB and 32 bits to RGBA, the channels forming one big-endian integer.
 */
export function unpackPng(payload: Uint8Array, scale: PackingScale, out: Float32Array): void {
  if (scale.bitsPerValue === 0 || scale.valueCount === 0) {
    fillConstant(scale, out);
    return;
  }
  let image: ReturnType<typeof decodePng>;
  try {
    image = decodePng(payload);
  } catch (error) {
    throw new Grib2PayloadError(`PNG payload could not be decoded: ${(error as Error).message}`);
  }
  const pixels = image.width * image.height;
  if (pixels !== scale.valueCount) {
    throw new Grib2PayloadError(`PNG is ${image.width} x ${image.height} = ${pixels} pixels but section 5 declares ${scale.valueCount} values`);
  }
  if (image.palette) throw new Grib2PayloadError("PNG payload uses a colour palette, which GRIB2 does not allow");
  const { offset, factor } = linearScale(scale);
  if (image.depth < 8) {
    unpackSubByte(image.data as Uint8Array, image.width, image.height, image.depth, offset, factor, out);
    return;
  }
  // 8- or 16-bit samples, one or more channels per pixel, combined most significant channel first.
  const data = image.data;
  const channels = image.channels;
  const channelScale = 2 ** image.depth;
  for (let p = 0, s = 0; p < pixels; p++) {
    let x = 0;
    for (let c = 0; c < channels; c++, s++) x = x * channelScale + data[s];
    out[p] = offset + x * factor;
  }
}

/** Depths 1, 2 and 4 arrive packed, each image row starting on a byte boundary. */
function unpackSubByte(data: Uint8Array, width: number, height: number, depth: number, offset: number, factor: number, out: Float32Array): void {
  const rowBytes = Math.ceil((width * depth) / 8);
  for (let row = 0; row < height; row++) {
    const reader = new BitReader(data.subarray(row * rowBytes, (row + 1) * rowBytes));
    for (let col = 0; col < width; col++) out[row * width + col] = offset + reader.read(depth) * factor;
  }
}
