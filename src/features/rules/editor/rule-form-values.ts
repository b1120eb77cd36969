import type { z } from "zod";
import type { CreateRuleInput, RuleDefinition, UpdateRuleInput, updateRuleInput } from "@shared/api/rules.ts";

/** What the editor's form holds: a full definition plus the change note (only sent for edits). */
export type RuleFormInput = z.input<typeof updateRuleInput>;

/** A new rule starts on the lowest severity, anywhere in its zones, notifying the on-call forecaster. */
export function newRuleValues(): RuleFormInput {
  return {
    name: "",
    description: "",
    expression: "",
    zoneIds: [],
    severity: "heads-up",
    spatialCondition: { kind: "any-point" },
    validTimeWindow: { kind: "any-time" },
    persistenceFrames: 1,
    coolDownHours: 6,
    recipients: { onCall: true, contactIds: [], groupIds: [] },
    enabled: true,
    changeNote: "",
  };
}

export function valuesFromDefinition(definition: RuleDefinition): RuleFormInput {
  return { ...structuredClone(definition), changeNote: "" };
}

export function createInputFrom(values: UpdateRuleInput): CreateRuleInput {
  const { changeNote: _note, ...definition } = values;
  return definition;
}
