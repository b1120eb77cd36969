import { describe, expect, it } from "vitest";
import { applyCompletion, completionsAt } from "../../../../src/features/rules/expression/expression-completions.ts";

/** Labels offered with the cursor at the "|" in `marked`. */
function labelsAt(marked: string, explicit = false): string[] {
  const cursor = marked.indexOf("|");
  const result = completionsAt(marked.replace("|", ""), cursor, { explicit, limit: 200 });
  return result ? result.items.map((item) => item.label) : [];
}

describe("expression completions at the cursor", () => {
  it("offers catalogue keys that start with the word typed so far", () => {
    // Derived in closed form: the catalogue's keys beginning "mlc" (shared/fields.ts).
    expect(labelsAt("mlc|")).toEqual(["mlcape", "mlcin"]);
    // Derived in closed form: the three shear layers and the effective-layer shear start "shear_".
    expect(labelsAt("mlcape >= 1000 and shear_|")).toEqual(["shear_0_1km", "shear_0_3km", "shear_0_6km", "shear_eff"]);
  });

  it("finds fields by part of their key and by their theme", () => {
    // Derived in closed form: "_6km" occurs inside these three catalogue keys only, in catalogue order.
    expect(labelsAt("_6km|")).toEqual(["shear_0_6km", "meanwind_0_6km_u", "meanwind_0_6km_v"]);
    // Derived in closed form: typing a theme name lists that theme's fields after the key matches.
    const helicity = labelsAt("helic|");
    expect(helicity).toEqual(expect.arrayContaining(["srh_0_1km", "srh_0_3km", "srh_eff", "eff_present"]));
  });

  it("offers the rule functions, and inserts a call with the cursor inside it", () => {
    const result = completionsAt("shear_0_6km >= k", 16)!;
    expect(result.items.map((item) => item.label)).toEqual(["kt"]); // Derived in closed form: only kt() starts with "k"
    const applied = applyCompletion("shear_0_6km >= k", result, result.items[0]!);
    expect(applied).toEqual({ text: "shear_0_6km >= kt()", cursor: 18 }); // Derived in closed form: cursor between the parentheses
  });

  it("does not add a second pair of parentheses when renaming a call", () => {
    const text = "hyp(meanwind_0_6km_u, meanwind_0_6km_v) >= 15";
    const result = completionsAt(text, 2)!;
    const item = result.items.find((i) => i.label === "hypot")!;
    // Derived in closed form: the whole word "hyp" becomes "hypot", the cursor lands after "(".
    expect(applyCompletion(text, result, item)).toEqual({ text: "hypot(meanwind_0_6km_u, meanwind_0_6km_v) >= 15", cursor: 6 });
  });

  it("offers a category field's labels after == and inside oneof()", () => {
    // Derived in closed form: jet_quadrant's labels that start "left" (shared/fields.ts QUADRANTS).
    expect(labelsAt("jet_quadrant == left|")).toEqual(["left_entrance", "left_exit"]);
    expect(labelsAt("jet_curv_class != |", true)).toEqual(["anticyclonic", "straight", "cyclonic"]);
    expect(labelsAt("oneof(jet_quadrant, left_exit, ri|")).toEqual(["right_entrance", "right_exit"]);
    // Derived in closed form: the first argument of oneof is the field, so labels do not fit there.
    expect(labelsAt("oneof(jet_q|")).toEqual(["jet_quadrant"]);
  });

  it("offers and / or after a value, not after an operator", () => {
    expect(labelsAt("mlcape >= 1000 a|")).toEqual(["and"]); // Derived in closed form: after a number only an operator fits
    expect(labelsAt("mlcape >= 1000 |", true)).toEqual(["and", "or"]);
    expect(labelsAt("no|")).toEqual(["not"]); // Derived in closed form: no catalogue key starts "no"
  });

  it("stays quiet where a list would only get in the way", () => {
    expect(labelsAt("mlcape >= |")).toEqual([]); // Derived in closed form: nothing typed and nothing asked for
    expect(labelsAt("jet_div > 1e|")).toEqual([]); // Derived in closed form: the "e" belongs to a number
    expect(labelsAt("mlcape|")).toEqual([]); // Derived in closed form: a key typed out in full
    expect(labelsAt("zzz|")).toEqual([]); // Derived in closed form: nothing in the catalogue matches
  });

  it("replaces the whole word around the cursor", () => {
    const result = completionsAt("mlcXape >= 1", 3)!;
    expect(result.from).toBe(0); // Derived in closed form
    expect(result.to).toBe(7); // Derived in closed form: the word runs on to "mlcXape"
    const item = result.items.find((i) => i.label === "mlcape")!;
    expect(applyCompletion("mlcXape >= 1", result, item)).toEqual({ text: "mlcape >= 1", cursor: 6 });
  });

  it("describes each field with its display unit and theme", () => {
    const item = completionsAt("shear_0_6", 9)!.items[0]!;
    expect(item.label).toBe("shear_0_6km");
    expect(item.detail.startsWith("kt · ")).toBe(true); // Source: shared/fields.ts, shear is displayed in knots
    expect(item.group).toBe("shear");
  });
});
