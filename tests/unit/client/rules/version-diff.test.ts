import { describe, expect, it } from "vitest";
import type { RuleDefinition } from "../../../../shared/api/rules.ts";
import { diffDefinitions, wordDiff } from "../../../../src/features/rules/history/version-diff.ts";

const base: RuleDefinition = {
  name: "Supercell ingredients",
  description: "",
  expression: "mlcape >= 1000 and shear_0_6km >= 20",
  zoneIds: [1, 2],
  severity: "serious",
  spatialCondition: { kind: "min-coverage", percent: 10 },
  validTimeWindow: { kind: "any-time" },
  persistenceFrames: 1,
  coolDownHours: 6,
  recipients: { onCall: true, contactIds: [], groupIds: [] },
  enabled: true,
};
const zoneLabel = (id: number) => ["", "AAA", "BBB", "CCC"][id] ?? `#${id}`;

describe("word-level difference of expressions", () => {
  it("shows a changed threshold as one word out and one word in", () => {
    // Derived in closed form: the longest common subsequence keeps every word but the number.
    expect(wordDiff("mlcape >= 1000 and shear_0_6km >= 20", "mlcape >= 1500 and shear_0_6km >= 20")).toEqual([
      { kind: "same", text: "mlcape >=" },
      { kind: "removed", text: "1000" },
      { kind: "added", text: "1500" },
      { kind: "same", text: "and shear_0_6km >= 20" },
    ]);
  });

  it("shows an added clause as added words only", () => {
    // Derived in closed form.
    expect(wordDiff("mlcape >= 1000", "mlcape >= 1000 and jet_div_favoured")).toEqual([
      { kind: "same", text: "mlcape >= 1000" },
      { kind: "added", text: "and jet_div_favoured" },
    ]);
  });

  it("treats spacing alone as no change, and splits operators from names", () => {
    expect(wordDiff("mlcape>=1000", "mlcape >= 1000")).toEqual([{ kind: "same", text: "mlcape >= 1000" }]); // Derived in closed form
    // Derived in closed form: "(" and ")" are words of their own.
    expect(wordDiff("a and b", "(a and b)")).toEqual([
      { kind: "added", text: "(" },
      { kind: "same", text: "a and b" },
      { kind: "added", text: ")" },
    ]);
  });

  it("compares empty texts", () => {
    expect(wordDiff("", "")).toEqual([]); // Derived in closed form
    expect(wordDiff("", "mlcape > 0")).toEqual([{ kind: "added", text: "mlcape > 0" }]); // Derived in closed form
  });
});

describe("field-by-field difference of two versions", () => {
  it("finds nothing between identical definitions", () => {
    expect(diffDefinitions(base, { ...base }, zoneLabel)).toEqual([]); // Derived in closed form
  });

  it("lists each changed part in plain words, in the editor's order", () => {
    const next: RuleDefinition = {
      ...base,
      expression: "mlcape >= 1500 and shear_0_6km >= 20",
      zoneIds: [2, 3],
      severity: "urgent",
      spatialCondition: { kind: "min-points", points: 5 },
      coolDownHours: 3,
      enabled: false,
    };
    const changes = diffDefinitions(base, next, zoneLabel);
    // Derived in closed form: the six parts edited above, nothing else.
    expect(changes.map((c) => c.label)).toEqual(["Expression", "Zones", "Severity", "Spatial condition", "Cool-down", "Switched"]);
    const zones = changes.find((c) => c.key === "zoneIds")!;
    expect(zones.added).toEqual(["CCC"]);
    expect(zones.removed).toEqual(["AAA"]);
    const severity = changes.find((c) => c.key === "severity")!;
    // Source: shared/rules/severity.ts, Bellwether's own scale labels.
    expect([severity.before, severity.after]).toEqual(["Serious", "Urgent"]);
    const spatial = changes.find((c) => c.key === "spatialCondition")!;
    expect(spatial.before).toBe("at least 10 % of the zone's points with data"); // Derived in closed form
    expect(spatial.after).toBe("at least 5 grid points in the zone"); // Derived in closed form
    expect(changes.find((c) => c.key === "expression")!.words).toContainEqual({ kind: "added", text: "1500" });
    expect(changes.find((c) => c.key === "enabled")).toMatchObject({ before: "on", after: "off" });
  });

  it("describes windows, persistence and recipients", () => {
    const next: RuleDefinition = {
      ...base,
      validTimeWindow: { kind: "clock-hours-utc", fromHour: 18, toHour: 3 },
      persistenceFrames: 2,
      recipients: { onCall: false, contactIds: [4], groupIds: [1, 2] },
    };
    const changes = diffDefinitions(base, next, zoneLabel, { group: (id) => `G${id}` });
    // Derived in closed form: a UTC clock window that wraps past midnight.
    expect(changes.find((c) => c.key === "validTimeWindow")!.after).toBe("valid 18Z to 03Z (across midnight)");
    expect(changes.find((c) => c.key === "persistenceFrames")!.after).toBe("2 consecutive frames of a run"); // Derived in closed form
    expect(changes.find((c) => c.key === "recipients")!.after).toBe("contact #4; groups G1, G2"); // Derived in closed form
  });
});
