/**
 * The one home of display units on the client. Values arrive in SI (m/s, J/kg, m, Pa); screens
 * show the units staff use. Features add their formatters here rather than converting inline.
 */

/** Metres per second in one knot: 1852 m per hour (BIPM SI Brochure, 9th ed. 2019, Table 8, nautical mile). */
const METERS_PER_SECOND_PER_KNOT = 1852 / 3600;

export function knotsFromMetersPerSecond(speed: number): number {
  return speed / METERS_PER_SECOND_PER_KNOT;
}

/** Rounds for display and shows "—" for missing values (NaN, null, undefined). */
export function formatNumber(value: number | null | undefined, fractionDigits = 0): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return "—";
  return value.toLocaleString("en-US", { minimumFractionDigits: fractionDigits, maximumFractionDigits: fractionDigits });
}

/** Wind or shear stored in m/s, shown in whole knots ("42 kt"). */
export function formatWindKnots(speed: number | null | undefined): string {
  if (speed === null || speed === undefined || !Number.isFinite(speed)) return "—";
  return `${formatNumber(knotsFromMetersPerSecond(speed))} kt`;
}

/** A count with its noun, singular or plural ("1 entry", "2,310 entries"). */
export function formatCount(count: number, singular: string, plural = `${singular}s`): string {
  return `${formatNumber(count)} ${count === 1 ? singular : plural}`;
}
