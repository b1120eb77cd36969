import { ccsdsSettings } from "./ccsds/options.ts";
import { decodeRice } from "./ccsds/rice-decoder.ts";
import type { CcsdsPacking, PackingScale } from "./data-representation.ts";
import { fillConstant, linearScale } from "./packing-scale.ts";

/** Template 5.42: integers coded with CCSDS 121.0-B lossless compression, then scaled like simple packing. */
export function unpackCcsds(payload: Uint8Array, scale: PackingScale, ccsds: CcsdsPacking, out: Float32Array): void {
  if (scale.bitsPerValue === 0 || scale.valueCount === 0) {
    fillConstant(scale, out);
    return;
  }
  const settings = ccsdsSettings(ccsds.flags, scale.bitsPerValue, ccsds.blockSize, ccsds.referenceSampleInterval);
  const integers = new Float64Array(scale.valueCount);
  decodeRice(payload, settings, integers);
  const { offset, factor } = linearScale(scale);
  // GRIB2 packs unsigned integers. With the "signed" option the coder only treats them as two's complement
  // while predicting, so a negative sample is the same bit pattern as an unsigned value 2^n higher.
  const wrap = 2 ** scale.bitsPerValue;
  for (let k = 0; k < integers.length; k++) {
    const x = integers[k];
    out[k] = offset + (x < 0 ? x + wrap : x) * factor;
  }
}
