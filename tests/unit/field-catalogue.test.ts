import { describe, expect, it } from "vitest";
import { COLUMN_FIELD_KEYS, FIELD_KEYS, FIELDS, JET_FIELD_KEYS, applyFieldRange, fieldByKey, toDisplayUnit } from "../../shared/fields.ts";

describe("field catalogue", () => {
  it("has unique keys, column fields first, then jet and frontogenesis fields", () => {
    expect(new Set(FIELD_KEYS).size).toBe(FIELD_KEYS.length);
    expect(FIELD_KEYS).toEqual([...COLUMN_FIELD_KEYS, ...JET_FIELD_KEYS]);
    expect(COLUMN_FIELD_KEYS.length).toBe(38);
    expect(FIELDS.filter((f) => f.source === "jet").map((f) => f.key)).toContain("fgen_700");
  });

  it("gives every field a unit, display unit, ordered range and a meaning", () => {
    for (const field of FIELDS) {
      expect(field.unit.length, field.key).toBeGreaterThan(0);
      expect(field.range[0], field.key).toBeLessThan(field.range[1]);
      expect(field.meaning.length, field.key).toBeGreaterThan(10);
      if (field.kind === "category") expect(field.categories?.length, field.key).toBeGreaterThan(1);
    }
  });

  it("shows wind and shear in knots", () => {
    // Derived in closed form: 1 kt = 1852 m per hour, so 20 m/s = 38.88 kt.
    for (const key of ["shear_0_6km", "storm_rm_u", "shear_eff", "jet_speed"]) {
      const field = fieldByKey(key)!;
      expect(field.display.unit).toBe("kt");
      expect(toDisplayUnit(field, 20)).toBeCloseTo(38.877, 3);
    }
    expect(toDisplayUnit(fieldByKey("mu_src_pres")!, 85000)).toBe(850);
  });

  it("applies the QC range: outside or NaN becomes NaN", () => {
    const cape = fieldByKey("mlcape")!;
    expect(applyFieldRange(cape, 2500)).toBe(2500);
    expect(applyFieldRange(cape, 10001)).toBeNaN();
    expect(applyFieldRange(cape, -1)).toBeNaN();
    expect(applyFieldRange(cape, Number.NaN)).toBeNaN();
  });

  it("lists the jet quadrant categories 0-5", () => {
    expect(fieldByKey("jet_quadrant")!.categories!.map((c) => c.code)).toEqual([0, 1, 2, 3, 4, 5]);
    expect(fieldByKey("nope")).toBeUndefined();
  });
});
