/**
 * Vertical coordinates (pressure or height above ground) and time coordinates of a variable,
 * read from its coordinate variables or scalar coordinates (CF conventions, sections 4.3, 4.4, 5.7).
 */
import { NetcdfDecodeError } from "./errors.ts";
import { textAttribute, type RawVariable } from "./raw-dataset.ts";
import { isLengthUnit, isPressureUnit, siConversion } from "./cf-units.ts";
import { parseTimeUnits, timeValueToIso } from "./cf-time.ts";
import type { NetcdfLevelType } from "./netcdf-types.ts";

export type VerticalLevels = { levelType: NetcdfLevelType; levels: number[] | null } | { unsupported: string };

export function verticalLevels(coordinate: RawVariable | undefined): VerticalLevels {
  if (!coordinate) return { levelType: "surface", levels: null };
  const units = textAttribute(coordinate.attributes, "units");
  const standardName = textAttribute(coordinate.attributes, "standard_name");
  const positive = textAttribute(coordinate.attributes, "positive")?.toLowerCase();
  const values = Array.from(coordinate.readNumeric());
  if (isPressureUnit(units)) {
    const toPa = siConversion(units, standardName);
    return { levelType: "isobaric", levels: values.map((value) => value * toPa.scale + toPa.offset) };
  }
  const heightLike = standardName === "height" || (standardName === undefined && (positive === "up" || /height/i.test(coordinate.name)));
  if (heightLike && isLengthUnit(units)) {
    const toMetres = siConversion(units, standardName);
    return { levelType: "heightAboveGround", levels: values.map((value) => value * toMetres.scale) };
  }
  return {
    unsupported: `vertical coordinate "${coordinate.name}" (${standardName ?? "no standard_name"}, units "${units ?? ""}") is neither pressure nor height above ground`,
  };
}

/** ISO 8601 UTC strings for every value of a time coordinate. */
export function timesOf(coordinate: RawVariable): string[] {
  const axis = parseTimeUnits(textAttribute(coordinate.attributes, "units"), textAttribute(coordinate.attributes, "calendar"), coordinate.name);
  return Array.from(coordinate.readNumeric(), (value) => timeValueToIso(value, axis, coordinate.name));
}

/** A forecast reference time variable's value; all its values must agree (one model run per file). */
export function referenceTimeOf(coordinate: RawVariable): string | null {
  const times = timesOf(coordinate);
  if (times.length === 0) return null;
  if (times.some((time) => time !== times[0])) {
    throw new NetcdfDecodeError("bad-time", `holds ${new Set(times).size} different reference times; one model run per file is supported`, coordinate.name);
  }
  return times[0];
}
