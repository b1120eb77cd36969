import { describe, expect, it } from "vitest";
import { COLUMN_FIELD_KEYS, fieldByKey } from "../../../../shared/fields.ts";
import { fieldGroups, fieldText } from "../../../../src/features/soundings/field-groups.ts";
import { directionFrom } from "../../../../src/features/soundings/sounding-summary.ts";
import { formatFieldValue } from "../../../../src/lib/format-units.ts";

const nothing = Object.fromEntries(COLUMN_FIELD_KEYS.map((k) => [k, null])) as Record<string, number | null>;

describe("column field table", () => {
  it("lists every column field once, grouped by theme in reading order", () => {
    const groups = fieldGroups(nothing);
    expect(groups.map((g) => g.theme)).toEqual(["buoyancy", "moisture", "lapse", "shear", "helicity", "composite"]);
    const keys = groups.flatMap((g) => g.rows.map((r) => r.key));
    expect([...keys].sort()).toEqual([...COLUMN_FIELD_KEYS].sort());
  });

  it("shows — for undefined values and carries each field's meaning", () => {
    const row = fieldGroups(nothing)[0].rows[0];
    expect(row.text).toBe("—");
    expect(row.meaning).toBe(fieldByKey(row.key)!.meaning);
  });

  it("shows wind fields in knots and pressure in hPa", () => {
    // Derived in closed form: 20 m/s × 3600/1852 = 38.9 kt, shown whole; 85 000 Pa = 850 hPa.
    expect(fieldText("shear_0_6km", { shear_0_6km: 20 })).toBe("39 kt");
    expect(fieldText("mu_src_pres", { mu_src_pres: 85000 })).toBe("850 hPa");
    expect(fieldText("mlcape", { mlcape: 2449.6 })).toBe("2,450 J/kg");
  });

  it("shows flags as yes/no and never a negative zero", () => {
    expect(formatFieldValue(fieldByKey("eff_present")!, 1)).toBe("yes");
    expect(formatFieldValue(fieldByKey("eff_present")!, 0)).toBe("no");
    expect(formatFieldValue(fieldByKey("mlcin")!, -0.3)).toBe("0");
  });
});

describe("directionFrom", () => {
  it("gives the meteorological direction the wind blows from", () => {
    // Derived in closed form: a wind toward the east (u > 0) comes from 270°, toward the north (v > 0) from 180°.
    expect(directionFrom(10, 0)).toBe(270);
    expect(directionFrom(0, 10)).toBe(180);
    expect(directionFrom(0, -10)).toBe(0);
    expect(directionFrom(-10, 0)).toBe(90);
  });
});
