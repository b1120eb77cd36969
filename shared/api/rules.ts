import { z } from "zod";
import { fieldByKey, isFieldKey, type FieldKey } from "../fields.ts";
import type { SpatialCondition } from "../rules/aggregate.ts";
import { MAX_EXPRESSION_LENGTH, parseRule } from "../rules/parse-rule.ts";
import type { RuleErrorCode } from "../rules/rule-ast.ts";
import { SEVERITY_KEYS } from "../rules/severity.ts";
import type { ValidTimeWindow } from "../rules/valid-time-window.ts";

export const severitySchema = z.enum(SEVERITY_KEYS);

/** A catalogue field holding plain numbers (not a yes/no flag or a category), e.g. for a zone maximum. */
const numberFieldKey = z
  .string()
  .refine(isFieldKey, { message: "Unknown field; use a key from the field catalogue", abort: true })
  .refine((key) => fieldByKey(key)?.kind === "number", { message: "Pick a field that holds numbers (not a yes/no or category field)" })
  .transform((key) => key as FieldKey);

export const spatialConditionSchema = z.discriminatedUnion("kind", [
  z.object({ kind: z.literal("any-point") }),
  z.object({ kind: z.literal("min-points"), points: z.number().int("Give a whole number of points").min(1).max(10_000_000) }),
  z.object({ kind: z.literal("min-coverage"), percent: z.number().gt(0, "Coverage must be above 0 %").max(100, "Coverage cannot exceed 100 %") }),
  z.object({
    kind: z.literal("zone-extreme"),
    statistic: z.enum(["max", "min"]),
    field: numberFieldKey,
    comparison: z.enum([">=", ">", "<=", "<"]),
    value: z.number().finite(),
  }),
]) satisfies z.ZodType<SpatialCondition>;

const hourOfDay = z.number().int().min(0).max(23);
const forecastHour = z.number().int().min(0).max(384);

export const validTimeWindowSchema = z.discriminatedUnion("kind", [
  z.object({ kind: z.literal("any-time") }),
  z
    .object({ kind: z.literal("forecast-hours"), fromHour: forecastHour, toHour: forecastHour })
    .refine((w) => w.fromHour <= w.toHour, { message: "The first forecast hour must not be after the last", path: ["toHour"] }),
  // fromHour > toHour is allowed: the window wraps past midnight UTC.
  z.object({ kind: z.literal("clock-hours-utc"), fromHour: hourOfDay, toHour: hourOfDay }),
]) satisfies z.ZodType<ValidTimeWindow>;

const ids = (what: string) => z.array(z.number().int().positive()).max(200).refine((list) => new Set(list).size === list.length, `Each ${what} may be listed once`);

export const recipientsSchema = z
  .object({ onCall: z.boolean(), contactIds: ids("contact"), groupIds: ids("group") })
  .refine((r) => r.onCall || r.contactIds.length > 0 || r.groupIds.length > 0, {
    message: "Choose at least one recipient: the on-call forecaster, a contact or a group",
  });

/**
 * The expression is checked exactly as the editor checks it. Each problem becomes one issue on
 * `expression` whose params carry the rule error code and the character range to underline.
 * The text is not trimmed, so positions match what the user typed.
 */
export const ruleExpressionSchema = z
  .string()
  .max(MAX_EXPRESSION_LENGTH, `An expression has at most ${MAX_EXPRESSION_LENGTH} characters`)
  .superRefine((expression, ctx) => {
    const result = parseRule(expression);
    if (result.ok) return;
    for (const e of result.errors) {
      ctx.addIssue({ code: "custom", message: e.message, params: { ruleErrorCode: e.code, position: e.position, length: e.length } });
    }
  });

export const ruleDefinition = z.object({
  name: z.string().trim().min(1, "Give the rule a name").max(120),
  description: z.string().trim().max(2000).default(""),
  expression: ruleExpressionSchema,
  zoneIds: ids("zone").min(1, "Pick at least one zone"),
  severity: severitySchema,
  spatialCondition: spatialConditionSchema,
  validTimeWindow: validTimeWindowSchema,
  /** K: the rule must hold in at least this many consecutive frames of a run. */
  persistenceFrames: z.number().int().min(1).max(48).default(1),
  /** No new trigger for the same rule and zone within this many hours, unless the severity rises. */
  coolDownHours: z.number().int().min(0).max(168).default(6),
  recipients: recipientsSchema,
  /** Minutes an open trigger may wait for acknowledgement before each escalation level; the office default when absent. */
  escalateAfterMinutes: z.number().int().min(1, "Escalate after at least 1 minute").max(1440, "Escalate within a day (1440 minutes)").optional(),
  enabled: z.boolean().default(true),
});
export type RuleDefinition = z.infer<typeof ruleDefinition>;

export const createRuleInput = ruleDefinition;
export type CreateRuleInput = z.infer<typeof createRuleInput>;

/** Every saved edit becomes a new immutable version; the note says why (shown in the history). */
export const updateRuleInput = ruleDefinition.extend({ changeNote: z.string().trim().max(500).default("") });
export type UpdateRuleInput = z.infer<typeof updateRuleInput>;

/** Live validation from the editor: the expression alone. */
export const checkExpressionInput = z.object({ expression: z.string().max(MAX_EXPRESSION_LENGTH * 2) });
export type CheckExpressionInput = z.infer<typeof checkExpressionInput>;

export const ruleErrorDto = z.object({
  code: z.string() as z.ZodType<RuleErrorCode>,
  message: z.string(),
  position: z.number().int(),
  length: z.number().int(),
});
export type RuleErrorDto = z.infer<typeof ruleErrorDto>;

export const expressionCheckDto = z.discriminatedUnion("ok", [
  z.object({ ok: z.literal(true), normalised: z.string(), fieldKeys: z.array(z.string()) }),
  z.object({ ok: z.literal(false), errors: z.array(ruleErrorDto) }),
]);
export type ExpressionCheckDto = z.infer<typeof expressionCheckDto>;

/** The DTO the check endpoint (and the editor, offline) returns for an expression. */
export function checkExpression(expression: string): ExpressionCheckDto {
  const result = parseRule(expression);
  return result.ok
    ? { ok: true, normalised: result.rule.normalised, fieldKeys: [...result.rule.fieldKeys] }
    : { ok: false, errors: result.errors.map((e) => ({ ...e })) };
}

export const ruleVersionDto = z.object({
  id: z.number().int(),
  version: z.number().int(),
  definition: ruleDefinition,
  createdBy: z.string().nullable(),
  createdAt: z.string(),
  changeNote: z.string(),
});
export type RuleVersionDto = z.infer<typeof ruleVersionDto>;

export const ruleDto = z.object({
  id: z.number().int(),
  name: z.string(),
  enabled: z.boolean(),
  createdBy: z.string().nullable(),
  createdAt: z.string(),
  updatedAt: z.string(),
  current: ruleVersionDto,
  /** Zones the rule uses that cover no point of a stored grid (the rule can never fire there). */
  emptyZoneIds: z.array(z.number().int()),
});
export type RuleDto = z.infer<typeof ruleDto>;

export const previewInput = z.object({
  expression: z.string().max(MAX_EXPRESSION_LENGTH * 2),
  frameId: z.number().int().positive().optional(),
  zoneIds: z.array(z.number().int().positive()).max(200).default([]),
  spatialCondition: spatialConditionSchema.default({ kind: "any-point" }),
});
export type PreviewInput = z.infer<typeof previewInput>;

export const backtestInput = z.object({
  versionId: z.number().int().positive().optional(),
  runs: z.number().int().min(1).max(50).default(3),
});
export type BacktestInput = z.infer<typeof backtestInput>;
