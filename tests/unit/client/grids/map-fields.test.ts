import { describe, expect, it } from "vitest";
import { defaultFieldKey, describeMapField, formatMapValue, groupMapFields } from "../../../../src/components/map/map-fields.ts";

const info = (key: string, unit = "1") => ({ key, unit });

describe("describing stored fields for the map", () => {
  it("reads catalogue fields from the catalogue", () => {
    const mlcape = describeMapField(info("mlcape", "J kg-1"));
    expect(mlcape).toMatchObject({ group: "buoyancy", kind: "number", signed: false, neverPositive: false });
    expect(mlcape.display.unit).toBe("J/kg");
    expect(describeMapField(info("mlcin")).neverPositive).toBe(true); // Source: shared/fields.ts, CIN range [-1500, 0]
    expect(describeMapField(info("jet_quadrant")).categories).toHaveLength(6);
  });

  it("labels the model's own surface fields from the shared stored-input list", () => {
    const t2m = describeMapField(info("t_2m", "K"));
    expect(t2m).toMatchObject({ group: "model", label: "t_2m · 2 m temperature", signed: false });
    expect(describeMapField(info("u_10m", "m s-1")).signed).toBe(true);
  });

  it("still shows a field it does not know, in its stored unit", () => {
    const odd = describeMapField(info("lightning_rate", "flashes km-2"));
    expect(odd).toMatchObject({ group: "other", label: "lightning_rate" });
    expect(odd.display).toMatchObject({ unit: "flashes km-2", scale: 1, offset: 0 });
  });

  it("groups fields in a fixed theme order and catalogue order within a theme", () => {
    // The API lists fields alphabetically; the picker should not.
    const groups = groupMapFields(["z_sfc", "t_2m", "srh_0_1km", "sbcape", "mlcape", "jet_speed", "mystery"].map((key) => info(key)));
    expect(groups.map((g) => g.group)).toEqual(["buoyancy", "helicity", "jet", "model", "other"]);
    expect(groups[0]!.fields.map((f) => f.key)).toEqual(["sbcape", "mlcape"]); // Source: shared/fields.ts catalogue order
    expect(groups[3]!.fields.map((f) => f.key)).toEqual(["t_2m", "z_sfc"]); // Source: shared/stored-inputs.ts order
  });

  it("opens on MLCAPE when the frame has it, else the first listed field", () => {
    expect(defaultFieldKey([info("t_2m"), info("mlcape")])).toBe("mlcape");
    expect(defaultFieldKey([info("t_2m"), info("shear_0_6km")])).toBe("shear_0_6km");
    expect(defaultFieldKey([])).toBeNull();
  });
});

describe("formatMapValue", () => {
  it("shows values in display units", () => {
    expect(formatMapValue(describeMapField(info("mlcape")), 1850.4)).toBe("1,850 J/kg");
    // 20 m/s × 3600/1852 = 38.88 kt. Source: BIPM SI Brochure, 9th ed. (2019), Table 8 (knot = 1852 m/h).
    expect(formatMapValue(describeMapField(info("shear_0_6km")), 20)).toBe("39 kt");
    // 300.15 K − 273.15 = 27.0 °C. Derived in closed form.
    expect(formatMapValue(describeMapField(info("t_2m")), 300.15)).toBe("27.0 °C");
    // 85 000 Pa = 850.0 hPa. Derived in closed form.
    expect(formatMapValue(describeMapField(info("p_sfc")), 85_000)).toBe("850.0 hPa");
    // 2.5e-5 s⁻¹ shown in 10⁻⁵ s⁻¹. Derived in closed form.
    expect(formatMapValue(describeMapField(info("jet_div")), 2.5e-5)).toBe("2.5 10⁻⁵ s⁻¹");
  });

  it("names flags and categories instead of printing codes", () => {
    expect(formatMapValue(describeMapField(info("jet_left_exit")), 1)).toBe("yes");
    expect(formatMapValue(describeMapField(info("jet_left_exit")), 0)).toBe("no");
    expect(formatMapValue(describeMapField(info("jet_quadrant")), 3)).toBe("left_exit"); // Source: shared/fields.ts code 3
    expect(formatMapValue(describeMapField(info("jet_quadrant")), 7)).toBe("code 7");
  });

  it("says so when a point has no value", () => {
    expect(formatMapValue(describeMapField(info("mlcape")), Number.NaN)).toBe("no value");
  });
});
