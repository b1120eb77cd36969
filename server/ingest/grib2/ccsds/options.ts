import { Grib2PayloadError } from "../errors.ts";

/**
 * Option bits of the GRIB2 CCSDS compression options mask (template 5.42 octet 22), which carries the option
 * word of the widely used CCSDS 121.0-B implementation: data signedness, sample storage, preprocessing,
 * the restricted code-option set and RSI padding.
 */
export const CCSDS_SIGNED = 1;
export const CCSDS_THREE_BYTE = 2;
export const CCSDS_MSB_FIRST = 4;
export const CCSDS_PREPROCESS = 8;
export const CCSDS_RESTRICTED = 16;
export const CCSDS_PAD_RSI = 32;

export interface CcsdsSettings {
  bitsPerSample: number;
  blockSize: number;
  /** Reference sample interval in blocks. */
  blocksPerInterval: number;
  preprocess: boolean;
  signed: boolean;
  padIntervals: boolean;
  /** Length in bits of the option identifier that starts every coded data set. */
  idLength: number;
}

/** Block sizes J allowed by CCSDS 121.0-B-2 (8 and 16) and its extension to 32 and 64. */
const BLOCK_SIZES = new Set([8, 16, 32, 64]);

export function ccsdsSettings(flags: number, bitsPerSample: number, blockSize: number, blocksPerInterval: number): CcsdsSettings {
  if (!BLOCK_SIZES.has(blockSize)) throw new Grib2PayloadError(`CCSDS block size ${blockSize} is not 8, 16, 32 or 64`);
  if (blocksPerInterval < 1 || blocksPerInterval > 4096) {
    throw new Grib2PayloadError(`CCSDS reference sample interval of ${blocksPerInterval} blocks is outside 1..4096`);
  }
  if (bitsPerSample < 1 || bitsPerSample > 32) throw new Grib2PayloadError(`CCSDS sample width ${bitsPerSample} is outside 1..32 bits`);
  return {
    bitsPerSample,
    blockSize,
    blocksPerInterval,
    preprocess: (flags & CCSDS_PREPROCESS) !== 0,
    signed: (flags & CCSDS_SIGNED) !== 0,
    padIntervals: (flags & CCSDS_PAD_RSI) !== 0,
    idLength: idLength(bitsPerSample, (flags & CCSDS_RESTRICTED) !== 0),
  };
}

/**
 * Option identifier length by sample resolution n (CCSDS 121.0-B-2, coded data set format): 3 bits for n <= 8,
 * 4 for n <= 16, 5 for n <= 32. The restricted set of code options (CCSDS 121.0-B-3) shortens it to 1 bit for
 * n <= 2 and 2 bits for n <= 4.
 */
function idLength(bits: number, restricted: boolean): number {
  if (restricted && bits <= 4) return bits <= 2 ? 1 : 2;
  if (bits <= 8) return 3;
  if (bits <= 16) return 4;
  return 5;
}
