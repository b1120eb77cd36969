import { z } from "zod";
import { SEVERITY_KEYS } from "../rules/severity.ts";
import { stormReportDto } from "./storm-reports.ts";

/** Bellwether's trigger states: open → acknowledged → cleared | expired | false alarm. */
export const TRIGGER_STATES = ["open", "acknowledged", "cleared", "expired", "false-alarm"] as const;
export type TriggerState = (typeof TRIGGER_STATES)[number];
export const ACTIVE_TRIGGER_STATES: readonly TriggerState[] = ["open", "acknowledged"];

export const TRIGGER_EVENT_KINDS = [
  "opened",
  "updated",
  "acknowledged",
  "commented",
  "cleared",
  "expired",
  "false-alarm",
  "escalated",
  "notified",
  "notify-failed",
] as const;
export type TriggerEventKind = (typeof TRIGGER_EVENT_KINDS)[number];

export const triggerEventDto = z.object({
  id: z.number().int(),
  kind: z.enum(TRIGGER_EVENT_KINDS),
  at: z.string(),
  actor: z.string().nullable(),
  note: z.string().nullable(),
  data: z.unknown().nullable(),
});
export type TriggerEventDto = z.infer<typeof triggerEventDto>;

export const fieldPeakDto = z.object({ key: z.string(), max: z.number().nullable(), min: z.number().nullable(), mean: z.number().nullable() });

export const triggerSummaryDto = z.object({
  id: z.number().int(),
  state: z.enum(TRIGGER_STATES),
  severity: z.enum(SEVERITY_KEYS),
  rule: z.object({ id: z.number().int(), name: z.string(), versionId: z.number().int(), version: z.number().int() }),
  zone: z.object({ id: z.number().int(), code: z.string(), name: z.string() }),
  model: z.string(),
  runTime: z.string(),
  firstValidTime: z.string(),
  lastValidTime: z.string(),
  openedAt: z.string(),
  updatedAt: z.string(),
  acknowledgedBy: z.string().nullable(),
  acknowledgedAt: z.string().nullable(),
  closedAt: z.string().nullable(),
  closeReason: z.string().nullable(),
  peak: z.object({ coveragePercent: z.number().nullable(), matchedPoints: z.number().int(), fields: z.array(fieldPeakDto) }),
  /** Change in peak coverage against the previous run, in percentage points (null when only one run). */
  trend: z.number().nullable(),
});
export type TriggerSummaryDto = z.infer<typeof triggerSummaryDto>;

export const triggerFrameDto = z.object({
  evaluationId: z.number().int(),
  frameId: z.number().int(),
  runTime: z.string(),
  validTime: z.string(),
  met: z.boolean(),
  reason: z.string(),
  matchedPoints: z.number().int(),
  zonePoints: z.number().int(),
  coveragePercent: z.number().nullable(),
  fields: z.array(fieldPeakDto),
});
export type TriggerFrameDto = z.infer<typeof triggerFrameDto>;

export const triggerDetailDto = triggerSummaryDto.extend({
  definition: z.unknown(),
  zoneGeometry: z.unknown(),
  frames: z.array(triggerFrameDto),
  events: z.array(triggerEventDto),
});
export type TriggerDetailDto = z.infer<typeof triggerDetailDto>;

export const triggersQuery = z.object({
  state: z.enum(TRIGGER_STATES).optional(),
  active: z.enum(["true", "false"]).optional(),
  severity: z.enum(SEVERITY_KEYS).optional(),
  zoneId: z.coerce.number().int().positive().optional(),
  ruleId: z.coerce.number().int().positive().optional(),
  limit: z.coerce.number().int().min(1).max(500).default(100),
  /** Only triggers opened before this id (paging, newest first). */
  beforeId: z.coerce.number().int().positive().optional(),
});
export type TriggersQuery = z.infer<typeof triggersQuery>;

export const acknowledgeInput = z.object({ note: z.string().trim().max(2000).optional() });
export const commentInput = z.object({ text: z.string().trim().min(1, "Write a comment").max(2000) });
export const falseAlarmInput = z.object({ reason: z.string().trim().min(3, "Say why this was a false alarm").max(500) });

/** One line of the timeline: a trigger, a grid arrival, an escalation or an observed storm report. */
export const timelineEntryDto = z.discriminatedUnion("kind", [
  z.object({ kind: z.literal("trigger"), at: z.string(), trigger: triggerSummaryDto }),
  z.object({ kind: z.literal("grid"), at: z.string(), jobId: z.number().int(), name: z.string(), state: z.string(), frameCount: z.number().int(), reason: z.string().nullable() }),
  z.object({ kind: z.literal("escalation"), at: z.string(), triggerId: z.number().int(), note: z.string().nullable() }),
  z.object({ kind: z.literal("report"), at: z.string(), report: stormReportDto }),
]);
export type TimelineEntryDto = z.infer<typeof timelineEntryDto>;

export const timelineQuery = z.object({
  limit: z.coerce.number().int().min(1).max(1000).default(300),
  /** ISO time: entries strictly before it (paging back). */
  before: z.iso.datetime({ offset: true }).optional(),
});
