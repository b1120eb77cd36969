import { describe, expect, it } from "vitest";
import { unitHintsFor } from "../../../../src/features/rules/expression/unit-hints.ts";
import { formatStorageUnit } from "../../../../src/lib/format-units.ts";

describe("unit hints for an expression", () => {
  it("turns a shear threshold written in m/s into knots", () => {
    const { fields } = unitHintsFor("shear_0_6km >= 20 and mlcape >= 1000");
    const shear = fields.find((f) => f.key === "shear_0_6km")!;
    expect(shear.storageUnit).toBe("m/s"); // Source: shared/fields.ts stores shear in m s-1
    expect(shear.displayUnit).toBe("kt");
    // Derived in closed form: 20 m/s × 3600/1852 = 38.88 kt (1 kt = 1852 m per hour, BIPM SI Brochure 9th ed., Table 8).
    expect(shear.conversions).toEqual(["shear_0_6km >= 20 m/s ≈ 39 kt"]);
    const cape = fields.find((f) => f.key === "mlcape")!;
    expect(cape.storageUnit).toBe("J/kg"); // Source: shared/fields.ts, J kg-1 shown as J/kg
    expect(cape.displayUnit).toBeNull(); // Derived in closed form: stored and shown alike, nothing to convert
    expect(cape.conversions).toEqual([]);
  });

  it("reads thresholds written on the left of the field", () => {
    const { fields } = unitHintsFor("10 < shear_eff");
    // Derived in closed form: 10 m/s × 3600/1852 = 19.44 kt, read as shear_eff > 10.
    expect(fields[0]!.conversions).toEqual(["shear_eff > 10 m/s ≈ 19 kt"]);
  });

  it("converts kt() calls into m/s", () => {
    // Derived in closed form: 40 × 1852/3600 = 20.58 m/s.
    expect(unitHintsFor("shear_0_6km >= kt(40)").knots).toEqual(["kt(40) = 20.6 m/s"]);
  });

  it("says nothing about a threshold that is part of arithmetic", () => {
    expect(unitHintsFor("shear_0_6km >= 20 * 2").fields[0]!.conversions).toEqual([]); // Derived in closed form
  });

  it("explains how yes/no and category fields are tested", () => {
    const { fields } = unitHintsFor("jet_div_favoured and jet_quadrant == left_exit");
    expect(fields.map((f) => f.key)).toEqual(["jet_div_favoured", "jet_quadrant"]);
    expect(fields[0]!.note).toMatch(/yes\/no/);
    expect(fields[1]!.note).toContain("3 left_exit"); // Source: shared/fields.ts, jet_quadrant code 3 is left_exit
  });

  it("keeps working while the expression is still invalid", () => {
    const { fields } = unitHintsFor("shear_0_6km >= 25 and mlcap");
    // Derived in closed form: 25 m/s × 3600/1852 = 48.6 kt.
    expect(fields.map((f) => f.conversions)).toEqual([["shear_0_6km >= 25 m/s ≈ 49 kt"]]);
  });
});

describe("storage units written for people", () => {
  it("writes negative powers as a division", () => {
    expect(formatStorageUnit("m s-1")).toBe("m/s"); // Common practice (no source): SI unit written with a solidus
    expect(formatStorageUnit("m2 s-2")).toBe("m²/s²"); // Common practice (no source)
    expect(formatStorageUnit("kg m-2")).toBe("kg/m²"); // Common practice (no source)
    expect(formatStorageUnit("K (100 km)-1 (3 h)-1")).toBe("K/100km/3h"); // Common practice (no source): as the catalogue's display unit
  });

  it("keeps a lone negative power and drops the dimensionless 1", () => {
    expect(formatStorageUnit("s-1")).toBe("s⁻¹"); // Common practice (no source)
    expect(formatStorageUnit("1")).toBe(""); // Common practice (no source): dimensionless
    expect(formatStorageUnit("Pa")).toBe("Pa");
  });
});
