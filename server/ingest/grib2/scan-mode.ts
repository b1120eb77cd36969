import { Grib2DecodeError, type Grib2ErrorLocation } from "./errors.ts";

/** Scanning mode flags (WMO-No. 306, GRIB2 Flag Table 3.4); bit 1 is the most significant bit of the octet. */
export interface ScanMode {
  /** Bit 1: points of the first row run in the -i (westward) direction. */
  iNegative: boolean;
  /** Bit 2: rows run in the +j (northward) direction; when clear the first row is the northernmost. */
  jPositive: boolean;
  /** Bit 3: adjacent points in the j direction are consecutive (column-major storage). */
  jConsecutive: boolean;
  /** Bit 4: adjacent rows (or columns) alternate direction. */
  alternateRows: boolean;
  /** The raw octet, kept for listings. */
  flags: number;
}

export function readScanMode(flags: number, where: Grib2ErrorLocation): ScanMode {
  // Bits 5-8 describe offset (staggered or hexagonal) rows, which none of Bellwether's grids use.
  if ((flags & 0x0f) !== 0) {
    throw new Grib2DecodeError(where, `scanning mode 0x${flags.toString(16)} uses staggered-row bits 5-8, which are not supported`);
  }
  return {
    iNegative: (flags & 0x80) !== 0,
    jPositive: (flags & 0x40) !== 0,
    jConsecutive: (flags & 0x20) !== 0,
    alternateRows: (flags & 0x10) !== 0,
    flags,
  };
}

/** True when values are already in the canonical order: rows west to east, south row first. */
export function isCanonicalScan(scan: ScanMode): boolean {
  return !scan.iNegative && scan.jPositive && !scan.jConsecutive && !scan.alternateRows;
}
