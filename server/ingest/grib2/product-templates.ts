import { readSignedInt32, readUint16, readUint32 } from "./bytes.ts";
import { Grib2DecodeError, type Grib2ErrorLocation } from "./errors.ts";
import { isoFromMilliseconds, utcMilliseconds } from "./identification.ts";
import { readFixedSurface, type FixedSurface } from "./levels.ts";
import type { SectionSpan } from "./sections.ts";
import { secondsPerTimeUnit } from "./time-units.ts";

/** Statistical processing over a time period (templates 4.8 and 4.11). */
export interface StatisticalPeriod {
  /** Code Table 4.10 figure, e.g. 0 average, 1 accumulation, 2 maximum, 3 minimum. */
  process: number;
  processName: string;
  startTime: string;
  endTime: string;
  lengthSeconds: number;
}

export interface EnsembleMember {
  /** Code Table 4.6 type of ensemble forecast. */
  type: number;
  perturbation: number;
  membersInEnsemble: number;
}

/** Section 4 decoded. */
export interface ProductDefinition {
  template: number;
  category: number;
  number: number;
  /** Code Table 4.3 type of generating process (0 analysis, 2 forecast, ...). */
  generatingProcessType: number;
  firstSurface: FixedSurface | null;
  secondSurface: FixedSurface | null;
  /** Valid time minus reference time; for statistics, the end of the period minus the reference time. */
  forecastSeconds: number;
  validTimeMs: number;
  statistics: StatisticalPeriod | null;
  ensemble: EnsembleMember | null;
}

/** Code Table 4.10 (type of statistical processing), the entries in common use. */
const STATISTICAL_PROCESS_NAMES: Record<number, string> = {
  0: "average",
  1: "accumulation",
  2: "maximum",
  3: "minimum",
  4: "difference-end-minus-start",
  5: "root-mean-square",
  6: "standard-deviation",
  8: "difference-start-minus-end",
};

/** Octet where the statistical block starts (0-based from the section start), by template. */
const STATISTICS_OFFSET: Record<number, number> = { 8: 34, 11: 37 };
const SUPPORTED = [0, 1, 8, 11];

export function readProductDefinition(
  bytes: Uint8Array,
  span: SectionSpan,
  refTimeMs: number,
  messageNumber: number,
): ProductDefinition {
  const o = span.offset;
  const where: Grib2ErrorLocation = { messageNumber, section: 4, byteOffset: o };
  const template = readUint16(bytes, o + 7);
  if (!SUPPORTED.includes(template)) {
    throw new Grib2DecodeError(
      { ...where, byteOffset: o + 7 },
      `product definition template 4.${template} is not supported (supported: 4.0, 4.1, 4.8, 4.11)`,
    );
  }
  const statsOffset = STATISTICS_OFFSET[template];
  const required = statsOffset !== undefined ? statsOffset + 24 : template === 1 ? 37 : 34;
  if (span.length < required) {
    throw new Grib2DecodeError(where, `template 4.${template} needs at least ${required} octets but the section declares ${span.length}`);
  }
  // Octets 10-34 are common to templates 4.0, 4.1, 4.8 and 4.11.
  const unitSeconds = secondsPerTimeUnit(bytes[o + 17], { ...where, byteOffset: o + 17 });
  const startSeconds = readSignedInt32(bytes, o + 18) * unitSeconds;
  const ensemble = template === 1 || template === 11 ? { type: bytes[o + 34], perturbation: bytes[o + 35], membersInEnsemble: bytes[o + 36] } : null;
  const statistics = statsOffset !== undefined ? readStatistics(bytes, span, o + statsOffset, refTimeMs, startSeconds, where) : null;
  const forecastSeconds = statistics ? (Date.parse(statistics.endTime) - refTimeMs) / 1000 : startSeconds;
  return {
    template,
    category: bytes[o + 9],
    number: bytes[o + 10],
    generatingProcessType: bytes[o + 11],
    firstSurface: readFixedSurface(bytes, o + 22),
    secondSurface: readFixedSurface(bytes, o + 28),
    forecastSeconds,
    validTimeMs: refTimeMs + forecastSeconds * 1000,
    statistics,
    ensemble,
  };
}

/**
 * End of the overall time interval (7 octets), number of time ranges, missing count, then 12 octets per range:
 * process, increment type, unit, length, increment unit, increment (WMO-No. 306, template 4.8 octets 35-58).
 * The first range describes the period that the field is processed over.
 */
function readStatistics(
  bytes: Uint8Array,
  span: SectionSpan,
  at: number,
  refTimeMs: number,
  startSeconds: number,
  where: Grib2ErrorLocation,
): StatisticalPeriod {
  const endMs = utcMilliseconds(
    {
      year: readUint16(bytes, at),
      month: bytes[at + 2],
      day: bytes[at + 3],
      hour: bytes[at + 4],
      minute: bytes[at + 5],
      second: bytes[at + 6],
    },
    { ...where, byteOffset: at },
    "end of the statistical period",
  );
  const ranges = bytes[at + 7];
  if (ranges < 1) throw new Grib2DecodeError({ ...where, byteOffset: at + 7 }, "statistical template declares no time range");
  const needed = at - span.offset + 12 + 12 * ranges;
  if (span.length < needed) {
    throw new Grib2DecodeError(where, `${ranges} time ranges need ${needed} octets but the section declares ${span.length}`);
  }
  const process = bytes[at + 12];
  const rangeUnit = secondsPerTimeUnit(bytes[at + 14], { ...where, byteOffset: at + 14 });
  const lengthSeconds = readUint32(bytes, at + 15) * rangeUnit;
  const startMs = refTimeMs + startSeconds * 1000;
  return {
    process,
    processName: STATISTICAL_PROCESS_NAMES[process] ?? `process-${process}`,
    startTime: isoFromMilliseconds(startMs),
    endTime: isoFromMilliseconds(endMs),
    lengthSeconds,
  };
}
