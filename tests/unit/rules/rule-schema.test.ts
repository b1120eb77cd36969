import { describe, expect, it } from "vitest";
import { checkExpression, createRuleInput, spatialConditionSchema, updateRuleInput } from "../../../shared/api/rules.ts";

const valid = {
  name: "  West zones: deep shear with buoyancy ",
  expression: "shear_0_6km >= kt(40) and mlcape >= 1000",
  zoneIds: [3, 4],
  severity: "serious",
  spatialCondition: { kind: "min-coverage", percent: 10 },
  validTimeWindow: { kind: "forecast-hours", fromHour: 0, toHour: 18 },
  recipients: { onCall: true, contactIds: [], groupIds: [7] },
};

describe("rule definition schema", () => {
  it("accepts a complete rule and fills the defaults", () => {
    const parsed = createRuleInput.parse(valid);
    expect(parsed.name).toBe("West zones: deep shear with buoyancy");
    expect(parsed).toMatchObject({ description: "", persistenceFrames: 1, coolDownHours: 6, enabled: true });
    expect(parsed.expression).toBe(valid.expression);
  });

  it("puts each expression error on `expression` with its code and character range", () => {
    const expression = "shear_0_6km >= kt(40) and mlcap >= 1000";
    const result = createRuleInput.safeParse({ ...valid, expression });
    expect(result.success).toBe(false);
    const issue = result.error!.issues.find((i) => i.path[0] === "expression")!;
    expect(issue.message).toContain('Unknown field "mlcap"');
    expect((issue as unknown as { params: unknown }).params).toEqual({ ruleErrorCode: "UNKNOWN_FIELD", position: expression.indexOf("mlcap"), length: 5 });
  });

  it("refuses missing zones, recipients, bad windows and out-of-range numbers, each with a message", () => {
    const cases: [Record<string, unknown>, string][] = [
      [{ zoneIds: [] }, "zoneIds"],
      [{ zoneIds: [2, 2] }, "zoneIds"],
      [{ recipients: { onCall: false, contactIds: [], groupIds: [] } }, "recipients"],
      [{ validTimeWindow: { kind: "forecast-hours", fromHour: 12, toHour: 6 } }, "validTimeWindow"],
      [{ validTimeWindow: { kind: "clock-hours-utc", fromHour: 24, toHour: 3 } }, "validTimeWindow"],
      [{ severity: "extreme" }, "severity"],
      [{ persistenceFrames: 0 }, "persistenceFrames"],
      [{ coolDownHours: -1 }, "coolDownHours"],
      [{ spatialCondition: { kind: "min-coverage", percent: 0 } }, "spatialCondition"],
      [{ spatialCondition: { kind: "min-points", points: 2.5 } }, "spatialCondition"],
    ];
    for (const [change, path] of cases) {
      const result = createRuleInput.safeParse({ ...valid, ...change });
      expect(result.success, JSON.stringify(change)).toBe(false);
      expect(result.error!.issues[0].path[0]).toBe(path);
      expect(result.error!.issues[0].message.length).toBeGreaterThan(0);
    }
  });

  it("a zone maximum must name a catalogue field that holds numbers", () => {
    const extreme = { kind: "zone-extreme", statistic: "max", comparison: ">=", value: 1 };
    expect(spatialConditionSchema.safeParse({ ...extreme, field: "stp_eff" }).success).toBe(true);
    const unknown = spatialConditionSchema.safeParse({ ...extreme, field: "stp" });
    expect(unknown.error!.issues.map((i) => i.message)).toEqual(["Unknown field; use a key from the field catalogue"]);
    const category = spatialConditionSchema.safeParse({ ...extreme, field: "jet_quadrant" });
    expect(category.error!.issues[0].message).toContain("holds numbers");
  });

  it("an update carries an optional note for the version history", () => {
    expect(updateRuleInput.parse({ ...valid, changeNote: " raised the shear threshold " }).changeNote).toBe("raised the shear threshold");
    expect(updateRuleInput.parse(valid).changeNote).toBe("");
  });
});

describe("checkExpression (the editor's live check)", () => {
  it("returns the normalised text and fields, or the positioned errors", () => {
    expect(checkExpression("MLCAPE > 1")).toEqual({
      ok: false,
      errors: [{ code: "UNKNOWN_FIELD", message: 'Unknown field "MLCAPE". Did you mean "mlcape"?', position: 0, length: 6 }],
    });
    expect(checkExpression("mlcape>1000 && eff_present")).toEqual({ ok: true, normalised: "mlcape > 1000 and eff_present", fieldKeys: ["mlcape", "eff_present"] });
  });
});
