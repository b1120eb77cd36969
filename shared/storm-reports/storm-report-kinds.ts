import { METERS_PER_SECOND_PER_KNOT } from "../meteo/constants.ts";

/** The kinds of observed severe weather Bellwether scores rules against. */
export const STORM_REPORT_KINDS = ["tornado", "hail", "wind"] as const;
export type StormReportKind = (typeof STORM_REPORT_KINDS)[number];

export const STORM_REPORT_KIND_LABELS: Record<StormReportKind, string> = { tornado: "Tornado", hail: "Hail", wind: "Wind" };

interface MagnitudeUnit {
  /** As written in the CSV's magnitude_unit column (matched without regard to case). */
  unit: string;
  /** Largest plausible value; anything above is a typo or a unit slip. */
  max: number;
  /** Whole numbers only (a rating). */
  integer: boolean;
  /** Converts to the stored SI value (hail diameter in m, wind speed in m/s; a tornado rating stays a rating). */
  toSi: (value: number) => number;
}

// 1 in = 0.0254 m and 1 mph = 0.44704 m/s exactly: NIST Special Publication 811 (2008), Appendix B.
const METRES_PER_INCH = 0.0254;
const METERS_PER_SECOND_PER_MPH = 0.44704;

/**
 * Units each kind accepts. Tornadoes carry an Enhanced Fujita rating 0–5 (unit "EF"); hail the
 * stone diameter in inches or millimetres; wind the measured or estimated gust in knots, m/s or
 * mph. The upper limits sit a little above the largest values on record, to catch slips only.
 */
export const MAGNITUDE_UNITS: Record<StormReportKind, readonly MagnitudeUnit[]> = {
  tornado: [{ unit: "EF", max: 5, integer: true, toSi: (v) => v }],
  hail: [
    { unit: "in", max: 10, integer: false, toSi: (v) => v * METRES_PER_INCH },
    { unit: "mm", max: 254, integer: false, toSi: (v) => v / 1000 },
  ],
  wind: [
    { unit: "kt", max: 250, integer: false, toSi: (v) => v * METERS_PER_SECOND_PER_KNOT },
    { unit: "m/s", max: 130, integer: false, toSi: (v) => v },
    { unit: "mph", max: 290, integer: false, toSi: (v) => v * METERS_PER_SECOND_PER_MPH },
  ],
};

export function magnitudeUnitFor(kind: StormReportKind, unit: string): MagnitudeUnit | undefined {
  const wanted = unit.trim().toLowerCase();
  return MAGNITUDE_UNITS[kind].find((u) => u.unit.toLowerCase() === wanted);
}

/** "EF2", "1.75 in", "65 kt", or "" when no magnitude was given. */
export function formatMagnitude(magnitude: number | null, unit: string | null): string {
  if (magnitude === null || unit === null) return "";
  return unit === "EF" ? `EF${magnitude}` : `${magnitude} ${unit}`;
}
