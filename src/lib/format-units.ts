/**
 * The one home of display units on the client. Values arrive in SI (m/s, J/kg, m, Pa); screens
 * show the units staff use. Features add their formatters here rather than converting inline.
 */

import { toDisplayUnit, type FieldDefinition } from "@shared/fields.ts";
import { ICE_POINT } from "@shared/meteo/constants.ts";

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

/** A catalogue field's stored (SI) value in its display unit and rounding, without the unit ("2,450", "39", "—"). */
export function formatFieldValue(field: FieldDefinition, value: number | null | undefined): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return "—";
  if (field.kind === "bool") return value === 1 ? "yes" : "no";
  if (field.kind === "category") return field.categories?.find((c) => c.code === value)?.label ?? String(value);
  const shown = toDisplayUnit(field, value);
  // A value that rounds to zero shows as "0", not "-0" (a CIN of −0.3 J/kg).
  return formatNumber(Number(shown.toFixed(field.display.decimals)) === 0 ? 0 : shown, field.display.decimals);
}

/** Kelvin shown as degrees Celsius ("18.6"). */
export function formatCelsius(temperature: number | null | undefined, fractionDigits = 1): string {
  if (temperature === null || temperature === undefined || !Number.isFinite(temperature)) return "—";
  return formatNumber(temperature - ICE_POINT, fractionDigits);
}

/** Pascals shown as hectopascals ("850"). */
export function formatHectopascals(pressure: number | null | undefined, fractionDigits = 0): string {
  if (pressure === null || pressure === undefined || !Number.isFinite(pressure)) return "—";
  return formatNumber(pressure / 100, fractionDigits);
}

const SUPERSCRIPT: Record<string, string> = { "-": "⁻", "0": "⁰", "1": "¹", "2": "²", "3": "³", "4": "⁴", "5": "⁵", "6": "⁶", "7": "⁷", "8": "⁸", "9": "⁹" };
const superscript = (exponent: string): string => [...exponent].map((c) => SUPERSCRIPT[c] ?? c).join("");

/**
 * A catalogue storage unit written the way people read it: "m s-1" → "m/s", "m2 s-2" → "m²/s²",
 * "s-1" → "s⁻¹", "K (100 km)-1 (3 h)-1" → "K/100km/3h", "1" → "" (dimensionless).
 */
export function formatStorageUnit(unit: string): string {
  if (unit === "1" || unit.trim() === "") return "";
  const factors: Array<{ base: string; exponent: number }> = [];
  for (const part of unit.match(/\([^)]*\)-?\d*|\S+/g) ?? []) {
    const match = /^(\([^)]*\)|[^\d-]+)(-?\d*)$/.exec(part);
    if (!match) return unit;
    factors.push({ base: match[1]!.replace(/[()\s]/g, ""), exponent: match[2] === "" ? 1 : Number(match[2]) });
  }
  const power = (base: string, exponent: number) => (exponent === 1 ? base : `${base}${superscript(String(exponent))}`);
  const numerator = factors.filter((f) => f.exponent > 0).map((f) => power(f.base, f.exponent));
  // With nothing above the line, negative powers read better than "1/s".
  if (numerator.length === 0) return factors.map((f) => power(f.base, f.exponent)).join(" ");
  return [numerator.join(" "), ...factors.filter((f) => f.exponent < 0).map((f) => power(f.base, -f.exponent))].join("/");
}
