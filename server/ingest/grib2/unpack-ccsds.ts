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
  for (let k = 0; k < integers.length; k++) out[k] = offset + integers[k] * factor;
}
