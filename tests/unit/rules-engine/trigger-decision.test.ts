import { describe, expect, it } from "vitest";
import { decideTrigger, type DecisionInput } from "../../../server/rules/trigger-decision.ts";

const R12 = "2026-05-14T12:00:00.000Z";
const R13 = "2026-05-14T13:00:00.000Z";
const V = (h: number) => `2026-05-14T${String(h).padStart(2, "0")}:00:00.000Z`;

function input(over: Partial<DecisionInput> & { result: DecisionInput["result"] }): DecisionInput {
  return { ruleId: 7, zoneId: 3, severity: "serious", coolDownHours: 6, active: [], lastClosed: null, ...over };
}
const met = (runTime: string, h: number, streak: number[] | null = [h]) => ({ runTime, validTime: V(h), met: true, qualifyingStreak: streak ? streak.map(V) : null });
const notMet = (runTime: string, h: number) => ({ runTime, validTime: V(h), met: false, qualifyingStreak: null });
const active = (matched: number[], runTime = R12, severity: "heads-up" | "serious" | "urgent" = "serious") => ({
  id: 42,
  severity,
  runTime,
  firstValidTime: V(matched[0]!),
  lastValidTime: V(matched.at(-1)!),
  matchedValidTimes: matched.map(V),
});

describe("decideTrigger", () => {
  it("opens a trigger keyed by rule, zone and first valid time of the event", () => {
    const d = decideTrigger(input({ result: met(R12, 18) }));
    expect(d).toMatchObject({ action: "open", key: `7:3:${V(18)}`, matchedValidTimes: [V(18)] });
  });

  it("gives the same key when the same frame is evaluated again (no duplicate trigger)", () => {
    const a = decideTrigger(input({ result: met(R12, 18) }));
    const b = decideTrigger(input({ result: met(R12, 18) }));
    expect(a).toEqual(b);
  });

  it("waits for K consecutive frames before opening (persistence)", () => {
    expect(decideTrigger(input({ result: met(R12, 18, null) })).action).toBe("none");
    const d = decideTrigger(input({ result: met(R12, 19, [18, 19]) }));
    expect(d).toMatchObject({ action: "open", firstValidTime: V(18), lastValidTime: V(19), matchedValidTimes: [V(18), V(19)] });
  });

  it("extends the active trigger for the next frame of the event instead of opening another", () => {
    const d = decideTrigger(input({ result: met(R12, 19), active: [active([18])] }));
    expect(d).toMatchObject({ action: "extend", triggerId: 42, lastValidTime: V(19), matchedValidTimes: [V(18), V(19)], changed: true });
  });

  it("records nothing new when a frame already in the trigger is seen again", () => {
    const d = decideTrigger(input({ result: met(R12, 18), active: [active([18])] }));
    expect(d).toMatchObject({ action: "extend", changed: false });
  });

  it("moves the trigger to the newer run that still matches", () => {
    const d = decideTrigger(input({ result: met(R13, 18), active: [active([18])] }));
    expect(d).toMatchObject({ action: "extend", runTime: R13, changed: true });
  });

  it("notes a severity rise (a newer rule version asking for more attention)", () => {
    const d = decideTrigger(input({ severity: "urgent", result: met(R12, 19), active: [active([18])] }));
    expect(d).toMatchObject({ action: "extend", severityRose: true });
  });

  it("takes back a valid time a newer run no longer matches, and clears when none is left", () => {
    const partly = decideTrigger(input({ result: notMet(R13, 18), active: [active([18, 19])] }));
    expect(partly).toMatchObject({ action: "retract", matchedValidTimes: [V(19)], clear: false });
    const all = decideTrigger(input({ result: notMet(R13, 18), active: [active([18])] }));
    expect(all).toMatchObject({ action: "retract", matchedValidTimes: [], clear: true });
  });

  it("ignores a not-met frame from an older run than the trigger's", () => {
    expect(decideTrigger(input({ result: notMet(R12, 18), active: [active([18], R13)] })).action).toBe("none");
  });

  it("holds back a new trigger within the cool-down unless the severity rises", () => {
    const lastClosed = { severity: "serious" as const, lastValidTime: V(15) };
    expect(decideTrigger(input({ result: met(R12, 18), lastClosed })).action).toBe("suppress");
    expect(decideTrigger(input({ severity: "urgent", result: met(R12, 18), lastClosed })).action).toBe("open");
    // Outside the 6 h cool-down the rule may fire again.
    expect(decideTrigger(input({ result: met(R12, 22), lastClosed })).action).toBe("open");
  });

  it("opens a second trigger for a separate event beyond the active one's window", () => {
    const d = decideTrigger(input({ coolDownHours: 2, result: met(R12, 23), active: [active([15])] }));
    expect(d.action).toBe("open");
  });
});
