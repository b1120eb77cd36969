import { isAllOnes, readSignedInt8, readUint32 } from "./bytes.ts";

/** A fixed surface from a product definition: type of surface, its name, and its value in SI units. */
export interface FixedSurface {
  /** Code figure from WMO-No. 306 GRIB2 Code Table 4.5. */
  typeCode: number;
  /** "isobaric" | "surface" | "heightAboveGround" | "meanSea" | another readable name, or "level-type-<code>". */
  levelType: string;
  /** Pa for pressure surfaces, m for heights and depths, 0 for surfaces without a value, NaN if coded missing. */
  level: number;
}

/** Readable names for the Code Table 4.5 entries that model output commonly uses. */
const LEVEL_TYPE_NAMES: Record<number, string> = {
  1: "surface",
  2: "cloudBase",
  3: "cloudTop",
  4: "zeroDegreeIsotherm",
  6: "maximumWind",
  7: "tropopause",
  8: "topOfAtmosphere",
  100: "isobaric",
  101: "meanSea",
  102: "altitudeAboveMeanSea",
  103: "heightAboveGround",
  104: "sigma",
  105: "hybrid",
  106: "depthBelowLand",
  108: "pressureFromGround",
  200: "entireAtmosphere",
};

/** Surfaces that Code Table 4.5 defines without a value (the scaled value is normally coded missing). */
const VALUELESS_TYPES = new Set([1, 2, 3, 4, 6, 7, 8, 101, 200]);

export function levelTypeName(typeCode: number): string {
  return LEVEL_TYPE_NAMES[typeCode] ?? `level-type-${typeCode}`;
}

/**
 * Reads type (1 octet), scale factor (1 octet, signed) and scaled value (4 octets) of a fixed surface; the value
 * is scaledValue x 10^-scaleFactor (WMO-No. 306, template 4.0 notes). Returns null when the type is 255 (none).
 */
export function readFixedSurface(bytes: Uint8Array, offset: number): FixedSurface | null {
  const typeCode = bytes[offset];
  if (typeCode === 255) return null;
  const missing = bytes[offset + 1] === 0xff || isAllOnes(bytes, offset + 2, 4);
  let level: number;
  if (missing) level = VALUELESS_TYPES.has(typeCode) ? 0 : Number.NaN;
  else level = roundScaled(readUint32(bytes, offset + 2), readSignedInt8(bytes, offset + 1));
  return { typeCode, levelType: levelTypeName(typeCode), level };
}

/** scaled x 10^-factor as one correctly rounded operation, so 15 x 10^-1 gives 1.5 exactly. */
function roundScaled(scaled: number, factor: number): number {
  return factor >= 0 ? scaled / 10 ** factor : scaled * 10 ** -factor;
}
