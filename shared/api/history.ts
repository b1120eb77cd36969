import { z } from "zod";
import { SEVERITY_KEYS } from "../rules/severity.ts";
import { TRIGGER_STATES, triggerEventDto, triggerSummaryDto } from "./triggers.ts";

const isoTime = z.iso.datetime({ offset: true });
const id = z.coerce.number().int().positive();

/** Filters of the alert history; every one optional. The period is when triggers opened. */
export const historyFilters = z.object({
  from: isoTime.optional(),
  to: isoTime.optional(),
  ruleId: id.optional(),
  ruleVersionId: id.optional(),
  zoneId: id.optional(),
  severity: z.enum(SEVERITY_KEYS).optional(),
  state: z.enum(TRIGGER_STATES).optional(),
  /** Username of whoever acknowledged; "none" for triggers nobody acknowledged. */
  acknowledgedBy: z.string().trim().min(1).max(64).optional(),
});
export type HistoryFilters = z.infer<typeof historyFilters>;

export const MAX_HISTORY_TRIGGERS = 10_000;
export const historyQuery = historyFilters.extend({ limit: z.coerce.number().int().min(1).max(MAX_HISTORY_TRIGGERS).default(2000) });
export type HistoryQuery = z.infer<typeof historyQuery>;

export const historyTriggerDto = triggerSummaryDto.extend({
  /** Minutes from opening to acknowledgement; null when nobody acknowledged. */
  minutesToAcknowledge: z.number().nullable(),
  escalations: z.number().int(),
  notificationsSent: z.number().int(),
  notificationsFailed: z.number().int(),
});
export type HistoryTriggerDto = z.infer<typeof historyTriggerDto>;

export const historySummaryDto = z.object({
  triggers: z.number().int(),
  byRule: z.array(z.object({ ruleId: z.number().int(), ruleName: z.string(), count: z.number().int() })),
  byState: z.array(z.object({ state: z.enum(TRIGGER_STATES), count: z.number().int() })),
  acknowledged: z.number().int(),
  /** Over acknowledged triggers: Hyndman and Fan (1996) definition 7. */
  minutesToAcknowledge: z.object({ median: z.number().nullable(), p90: z.number().nullable() }),
  escalations: z.number().int(),
  /** Notifications that failed for good (after every retry). */
  notificationFailures: z.number().int(),
  notificationsSent: z.number().int(),
});
export type HistorySummaryDto = z.infer<typeof historySummaryDto>;

export const historyPageDto = z.object({
  triggers: z.array(historyTriggerDto),
  summary: historySummaryDto,
  /** True when more triggers matched than `limit`; the summary covers only those returned. */
  truncated: z.boolean(),
  /** Everyone who has acknowledged any trigger, for the filter. */
  acknowledgers: z.array(z.string()),
});
export type HistoryPageDto = z.infer<typeof historyPageDto>;

export const historyNotificationDto = z.object({
  id: z.number().int(),
  channel: z.string(),
  recipient: z.string(),
  address: z.string(),
  /** Why it was written: opened, severity-rose, escalated, digest. */
  change: z.string(),
  level: z.number().int().nullable(),
  state: z.string(),
  attempts: z.number().int(),
  createdAt: z.string(),
  sentAt: z.string().nullable(),
  lastError: z.string().nullable(),
  /** Every delivery attempt, oldest first. */
  deliveries: z.array(
    z.object({ attempt: z.number().int(), outcome: z.string(), startedAt: z.string(), finishedAt: z.string().nullable(), error: z.string().nullable() }),
  ),
});
export type HistoryNotificationDto = z.infer<typeof historyNotificationDto>;

/** One line of a trigger's story: something that happened to it, or a message about it. */
export const historyTimelineItemDto = z.discriminatedUnion("kind", [
  z.object({ kind: z.literal("event"), at: z.string(), event: triggerEventDto }),
  z.object({ kind: z.literal("notification"), at: z.string(), notification: historyNotificationDto }),
]);
export type HistoryTimelineItemDto = z.infer<typeof historyTimelineItemDto>;

export const historyTriggerDetailDto = z.object({
  trigger: historyTriggerDto,
  timeline: z.array(historyTimelineItemDto),
});
export type HistoryTriggerDetailDto = z.infer<typeof historyTriggerDetailDto>;
