import { readUint16 } from "./bytes.ts";
import { Grib2DecodeError, type Grib2ErrorLocation } from "./errors.ts";
import type { SectionSpan } from "./sections.ts";

/** Section 1 (identification), WMO-No. 306 GRIB2 section 1. */
export interface Identification {
  centre: number;
  subCentre: number;
  masterTablesVersion: number;
  /** Code table 1.2: 0 analysis, 1 start of forecast, ... */
  refTimeSignificance: number;
  /** Reference time as milliseconds since 1970-01-01T00:00:00Z. */
  refTimeMs: number;
  productionStatus: number;
  dataType: number;
}

export function readIdentification(bytes: Uint8Array, span: SectionSpan, messageNumber: number): Identification {
  const o = span.offset;
  const where: Grib2ErrorLocation = { messageNumber, section: 1, byteOffset: o + 12 };
  const refTimeMs = utcMilliseconds(
    {
      year: readUint16(bytes, o + 12),
      month: bytes[o + 14],
      day: bytes[o + 15],
      hour: bytes[o + 16],
      minute: bytes[o + 17],
      second: bytes[o + 18],
    },
    where,
    "reference time",
  );
  return {
    centre: readUint16(bytes, o + 5),
    subCentre: readUint16(bytes, o + 7),
    masterTablesVersion: bytes[o + 9],
    refTimeSignificance: bytes[o + 11],
    refTimeMs,
    productionStatus: bytes[o + 19],
    dataType: bytes[o + 20],
  };
}

export interface CalendarTime {
  year: number;
  month: number;
  day: number;
  hour: number;
  minute: number;
  second: number;
}

/** Converts a GRIB calendar time to epoch milliseconds, refusing impossible dates instead of rolling them over. */
export function utcMilliseconds(t: CalendarTime, where: Grib2ErrorLocation, what: string): number {
  const ms = Date.UTC(t.year, t.month - 1, t.day, t.hour, t.minute, t.second);
  const back = new Date(ms);
  const valid =
    t.month >= 1 &&
    t.month <= 12 &&
    back.getUTCFullYear() === t.year &&
    back.getUTCMonth() === t.month - 1 &&
    back.getUTCDate() === t.day &&
    t.hour < 24 &&
    t.minute < 60 &&
    t.second < 60;
  if (!valid) {
    const text = `${t.year}-${t.month}-${t.day} ${t.hour}:${t.minute}:${t.second}`;
    throw new Grib2DecodeError(where, `${what} ${text} is not a valid UTC date and time`);
  }
  return ms;
}

/** ISO 8601 UTC without milliseconds, e.g. 2024-05-01T12:00:00Z. */
export function isoFromMilliseconds(ms: number): string {
  return new Date(ms).toISOString().replace(/\.\d{3}Z$/, "Z");
}
