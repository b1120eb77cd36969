/**
 * Converts the units a NetCDF file declares (UDUNITS spellings as used under the CF conventions)
 * to the SI units Bellwether stores: K, Pa, m, m s-1, kg kg-1, %, J kg-1, m2 s-2 ...
 * si = value × scale + offset. Units not listed pass through unchanged (scale 1, offset 0).
 */

export interface UnitConversion {
  /** The unit of the converted values. */
  unit: string;
  scale: number;
  offset: number;
}

const KNOT = 1852 / 3600; // exact by the definition of the nautical mile
const ICE_POINT = 273.15;

const identity = (unit: string): UnitConversion => ({ unit, scale: 1, offset: 0 });
const scaled = (unit: string, scale: number): UnitConversion => ({ unit, scale, offset: 0 });

// Keys are normalised spellings (see normaliseUnit).
const CONVERSIONS: Record<string, UnitConversion> = {
  // temperature
  k: identity("K"),
  kelvin: identity("K"),
  degk: identity("K"),
  deg_k: identity("K"),
  degrees_k: identity("K"),
  degc: { unit: "K", scale: 1, offset: ICE_POINT },
  deg_c: { unit: "K", scale: 1, offset: ICE_POINT },
  degreec: { unit: "K", scale: 1, offset: ICE_POINT },
  degrees_c: { unit: "K", scale: 1, offset: ICE_POINT },
  degree_c: { unit: "K", scale: 1, offset: ICE_POINT },
  celsius: { unit: "K", scale: 1, offset: ICE_POINT },
  degree_celsius: { unit: "K", scale: 1, offset: ICE_POINT },
  degrees_celsius: { unit: "K", scale: 1, offset: ICE_POINT },
  "°c": { unit: "K", scale: 1, offset: ICE_POINT },
  degf: { unit: "K", scale: 5 / 9, offset: ICE_POINT - (32 * 5) / 9 },
  deg_f: { unit: "K", scale: 5 / 9, offset: ICE_POINT - (32 * 5) / 9 },
  degrees_f: { unit: "K", scale: 5 / 9, offset: ICE_POINT - (32 * 5) / 9 },
  fahrenheit: { unit: "K", scale: 5 / 9, offset: ICE_POINT - (32 * 5) / 9 },
  // pressure
  pa: identity("Pa"),
  pascal: identity("Pa"),
  hpa: scaled("Pa", 100),
  mb: scaled("Pa", 100),
  mbar: scaled("Pa", 100),
  millibar: scaled("Pa", 100),
  millibars: scaled("Pa", 100),
  kpa: scaled("Pa", 1000),
  bar: scaled("Pa", 1e5),
  // length and geopotential height (gpm is used as height, as is the trade's practice)
  m: identity("m"),
  meter: identity("m"),
  meters: identity("m"),
  metre: identity("m"),
  metres: identity("m"),
  gpm: identity("m"),
  "gp m": identity("m"),
  dam: scaled("m", 10),
  gpdam: scaled("m", 10),
  km: scaled("m", 1000),
  cm: scaled("m", 0.01),
  mm: scaled("m", 0.001),
  // speed
  "m s-1": identity("m s-1"),
  "m/s": identity("m s-1"),
  "ms-1": identity("m s-1"),
  "meter second-1": identity("m s-1"),
  "meters/second": identity("m s-1"),
  "metres/second": identity("m s-1"),
  "m sec-1": identity("m s-1"),
  "meters per second": identity("m s-1"),
  knot: scaled("m s-1", KNOT),
  knots: scaled("m s-1", KNOT),
  kt: scaled("m s-1", KNOT),
  kts: scaled("m s-1", KNOT),
  "km/h": scaled("m s-1", 1000 / 3600),
  "km h-1": scaled("m s-1", 1000 / 3600),
  kph: scaled("m s-1", 1000 / 3600),
  mph: scaled("m s-1", 0.44704),
  "cm s-1": scaled("m s-1", 0.01),
  // moisture
  "kg kg-1": identity("kg kg-1"),
  "kg/kg": identity("kg kg-1"),
  "g kg-1": scaled("kg kg-1", 0.001),
  "g/kg": scaled("kg kg-1", 0.001),
  "%": identity("%"),
  percent: identity("%"),
  // energy and helicity
  "j kg-1": identity("J kg-1"),
  "j/kg": identity("J kg-1"),
  "m2 s-2": identity("m2 s-2"),
  "m2/s2": identity("m2 s-2"),
  // rates and amounts
  "s-1": identity("s-1"),
  "1/s": identity("s-1"),
  "/s": identity("s-1"),
  "pa s-1": identity("Pa s-1"),
  "pa/s": identity("Pa s-1"),
  "hpa s-1": scaled("Pa s-1", 100),
  "k s-1": identity("K s-1"),
  "kg m-2": identity("kg m-2"),
  "kg/m2": identity("kg m-2"),
  "kg m-2 s-1": identity("kg m-2 s-1"),
  "1": identity("1"),
};

// Standard names whose values are fractions in "1" but stored as percentages.
const PERCENT_QUANTITIES = new Set(["relative_humidity"]);

/** Lower-case, single spaces, exponent markers removed: "m s**-1", "m s^-1", "m.s-1" → "m s-1". */
export function normaliseUnit(units: string): string {
  return units
    .trim()
    .toLowerCase()
    .replace(/\*\*|\^/g, "")
    .replace(/(?<=[a-z0-9])\.(?=[a-z])/g, " ")
    .replace(/\s+/g, " ");
}

/**
 * How to bring values declared in `units` to Bellwether's SI unit. `standardName` decides the
 * cases a unit alone cannot (a relative humidity given as a fraction "1" becomes %).
 */
export function siConversion(units: string | undefined, standardName: string | undefined): UnitConversion {
  if (units === undefined || units.trim() === "") {
    return standardName && PERCENT_QUANTITIES.has(standardName) ? scaled("%", 100) : identity("1");
  }
  const key = normaliseUnit(units);
  if (key === "1" && standardName && PERCENT_QUANTITIES.has(standardName)) return scaled("%", 100);
  return CONVERSIONS[key] ?? identity(units.trim());
}

/** True when `units` is a pressure unit this module converts. */
export function isPressureUnit(units: string | undefined): boolean {
  return units !== undefined && CONVERSIONS[normaliseUnit(units)]?.unit === "Pa";
}

/** True when `units` is a length unit this module converts. */
export function isLengthUnit(units: string | undefined): boolean {
  return units !== undefined && CONVERSIONS[normaliseUnit(units)]?.unit === "m";
}
