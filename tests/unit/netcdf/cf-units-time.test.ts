import { describe, expect, it } from "vitest";
import { normaliseUnit, siConversion } from "../../../server/ingest/netcdf/cf-units.ts";
import { parseTimeUnits, timeValueToIso } from "../../../server/ingest/netcdf/cf-time.ts";
import { NetcdfDecodeError } from "../../../server/ingest/netcdf/errors.ts";

const convert = (value: number, units: string, standardName?: string) => {
  const c = siConversion(units, standardName);
  return { value: value * c.scale + c.offset, unit: c.unit };
};

describe("unit conversion to SI", () => {
  it.each([
    // Source: 0 °C = 273.15 K (SI brochure, BIPM 2019).
    [25, "degC", 298.15, "K"],
    [25, "Celsius", 298.15, "K"],
    [300, "K", 300, "K"],
    // Source: °F → K: (F − 32) × 5/9 + 273.15 (NIST SP 811), 212 °F = 373.15 K.
    [212, "degF", 373.15, "K"],
    // Source: 1 hPa = 1 mb = 100 Pa (definition).
    [850, "hPa", 85_000, "Pa"],
    [850, "mb", 85_000, "Pa"],
    [85, "kPa", 85_000, "Pa"],
    // Source: 1 kt = 1852/3600 m s⁻¹ (international nautical mile, exact).
    [50, "knots", (50 * 1852) / 3600, "m s-1"],
    [50, "kt", (50 * 1852) / 3600, "m s-1"],
    [36, "km/h", 10, "m s-1"],
    [12, "m s**-1", 12, "m s-1"],
    [12, "m/s", 12, "m s-1"],
    // Common practice (no source): geopotential metres are used as metres; 1 dam = 10 m.
    [5640, "gpm", 5640, "m"],
    [564, "dam", 5640, "m"],
    // Source: 1 g/kg = 0.001 kg/kg (definition).
    [12, "g/kg", 0.012, "kg kg-1"],
    [0.012, "kg kg-1", 0.012, "kg kg-1"],
    [2500, "J/kg", 2500, "J kg-1"],
    [250, "m^2/s^2", 250, "m2 s-2"],
  ])("%s %s → %s %s", (value, units, expected, unit) => {
    const result = convert(value, units);
    expect(result.value).toBeCloseTo(expected, 9);
    expect(result.unit).toBe(unit);
  });

  it("relative humidity given as a fraction becomes percent", () => {
    // Derived in closed form: a fraction of 1 is 100 %.
    expect(convert(0.85, "1", "relative_humidity")).toEqual({ value: 85, unit: "%" });
    expect(convert(85, "%", "relative_humidity")).toEqual({ value: 85, unit: "%" });
  });

  it("unknown units pass through unchanged", () => {
    // Common practice (no source): an unrecognised unit is reported as the file wrote it.
    expect(siConversion("furlongs fortnight-1", undefined)).toEqual({ unit: "furlongs fortnight-1", scale: 1, offset: 0 });
  });

  it("normalises UDUNITS spellings", () => {
    // Source: UDUNITS-2 accepts "**" and "^" as exponent markers and "." as multiplication.
    expect(normaliseUnit(" m  s**-1 ")).toBe("m s-1");
    expect(normaliseUnit("kg.kg^-1")).toBe("kg kg-1");
  });
});

describe("CF time coordinates", () => {
  it.each([
    // Source: CF conventions, section 4.4 (units "<unit> since <date>"); expected instants derived in closed form.
    ["hours since 2024-05-20 12:00:00", 6, "2024-05-20T18:00:00.000Z"],
    ["hours since 2024-05-20T12:00:00Z", 0.5, "2024-05-20T12:30:00.000Z"],
    ["minutes since 2024-05-20 12:00", 90, "2024-05-20T13:30:00.000Z"],
    ["seconds since 1970-01-01 00:00:00", 1_716_206_400, "2024-05-20T12:00:00.000Z"],
    ["days since 2024-02-28", 1, "2024-02-29T00:00:00.000Z"],
    ["days since 2024-2-28 0:0:0", 2, "2024-03-01T00:00:00.000Z"],
    ["hours since 2024-05-20 06:00:00 +06:00", 0, "2024-05-20T00:00:00.000Z"],
    ["hours since 2024-05-20 00:00:00 UTC", 12, "2024-05-20T12:00:00.000Z"],
  ])("%s, value %s → %s", (units, value, expected) => {
    expect(timeValueToIso(value, parseTimeUnits(units, undefined, "time"), "time")).toBe(expected);
  });

  it("accepts the Gregorian calendar names and refuses the others", () => {
    // Source: CF conventions, section 4.4.1 (calendar attribute values).
    expect(() => parseTimeUnits("hours since 2024-01-01", "proleptic_gregorian", "time")).not.toThrow();
    expect(() => parseTimeUnits("hours since 2024-01-01", "noleap", "time")).toThrow(NetcdfDecodeError);
  });

  it("refuses months and malformed units with a clear message", () => {
    // Source: CF conventions, section 4.4 (months and years are discouraged: their length varies).
    expect(() => parseTimeUnits("months since 2024-01-01", undefined, "time")).toThrow(/time unit "months"/);
    expect(() => parseTimeUnits("hours after 2024-01-01", undefined, "time")).toThrow(/<unit> since <date>/);
  });
});
