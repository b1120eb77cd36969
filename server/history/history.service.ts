import type { DataSource } from "typeorm";
import { In, IsNull, Not } from "typeorm";
import {
  type HistoryFilters,
  type HistoryNotificationDto,
  type HistoryPageDto,
  type HistoryQuery,
  type HistorySummaryDto,
  type HistoryTimelineItemDto,
  type HistoryTriggerDetailDto,
  type HistoryTriggerDto,
  MAX_HISTORY_TRIGGERS,
} from "../../shared/api/history.ts";
import { TRIGGER_STATES, type TriggerSummaryDto } from "../../shared/api/triggers.ts";
import { medianAndP90 } from "../../shared/verification/sample-quantile.ts";
import { TriggerEntity } from "../entities/trigger.entity.ts";
import { TriggerEventEntity } from "../entities/trigger-event.entity.ts";
import { NotificationEntity } from "../entities/notification.entity.ts";
import { DeliveryAttemptEntity } from "../entities/delivery-attempt.entity.ts";
import type { TriggerService } from "../services/trigger.service.ts";
import { historyCsv } from "./history-csv.ts";

/** SQLite allows many bound variables, but chunking keeps `IN (...)` lists modest. */
const CHUNK = 500;
function chunks<T>(items: readonly T[]): T[][] {
  const out: T[][] = [];
  for (let k = 0; k < items.length; k += CHUNK) out.push(items.slice(k, k + CHUNK));
  return out;
}

const minutesBetween = (from: string, to: string) => (Date.parse(to) - Date.parse(from)) / 60_000;

interface TriggerExtras {
  escalations: Map<number, number>;
  notifications: Map<number, NotificationEntity[]>;
}

/** The alert history managers review: every trigger with filters, its figures, its story, and exports. */
export class HistoryService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly triggers: TriggerService,
  ) {}

  async list(query: HistoryQuery): Promise<HistoryPageDto> {
    const rows = await this.filtered(query, query.limit + 1);
    const truncated = rows.length > query.limit;
    const triggers = await this.withFigures(rows.slice(0, query.limit));
    return { triggers, summary: summarise(triggers), truncated, acknowledgers: await this.acknowledgers() };
  }

  /** The filtered history as CSV, newest first, up to the history's hard limit. */
  async csv(filters: HistoryFilters): Promise<string> {
    return historyCsv(await this.withFigures(await this.filtered(filters, MAX_HISTORY_TRIGGERS)));
  }

  /** One trigger with everything that happened to it and every message sent about it, in time order. */
  async detail(id: number): Promise<HistoryTriggerDetailDto> {
    const row = await this.triggers.find(id);
    const [trigger] = await this.withFigures([row]);
    const events = await this.dataSource.getRepository(TriggerEventEntity).find({ where: { triggerId: id }, order: { id: "ASC" } });
    const notifications = (await this.notificationsFor([id])).get(id) ?? [];
    const attempts = notifications.length
      ? await this.dataSource.getRepository(DeliveryAttemptEntity).find({ where: { notificationId: In(notifications.map((n) => n.id)) }, order: { attempt: "ASC" } })
      : [];
    const timeline: HistoryTimelineItemDto[] = [
      ...events.map((e) => ({
        kind: "event" as const,
        at: e.at,
        event: { id: e.id, kind: e.kind, at: e.at, actor: e.actor, note: e.note, data: e.data ? (JSON.parse(e.data) as unknown) : null },
      })),
      ...notifications.map((n) => ({ kind: "notification" as const, at: n.createdAt, notification: toNotificationDto(n, attempts.filter((a) => a.notificationId === n.id)) })),
    ];
    // Stable: at equal times, events (written first in the same transaction) stay ahead of their messages.
    timeline.sort((a, b) => a.at.localeCompare(b.at));
    return { trigger: trigger!, timeline };
  }

  private async filtered(filters: HistoryFilters, limit: number): Promise<TriggerEntity[]> {
    const qb = this.dataSource.getRepository(TriggerEntity).createQueryBuilder("t");
    if (filters.from) qb.andWhere("t.opened_at >= :from", { from: new Date(filters.from).toISOString() });
    if (filters.to) qb.andWhere("t.opened_at <= :to", { to: new Date(filters.to).toISOString() });
    if (filters.ruleId) qb.andWhere("t.rule_id = :ruleId", { ruleId: filters.ruleId });
    if (filters.ruleVersionId) qb.andWhere("t.rule_version_id = :ruleVersionId", { ruleVersionId: filters.ruleVersionId });
    if (filters.zoneId) qb.andWhere("t.zone_id = :zoneId", { zoneId: filters.zoneId });
    if (filters.severity) qb.andWhere("t.severity = :severity", { severity: filters.severity });
    if (filters.state) qb.andWhere("t.state = :state", { state: filters.state });
    if (filters.acknowledgedBy === "none") qb.andWhere("t.acknowledged_by IS NULL");
    else if (filters.acknowledgedBy) qb.andWhere("t.acknowledged_by = :who", { who: filters.acknowledgedBy });
    return qb.orderBy("t.opened_at", "DESC").addOrderBy("t.id", "DESC").take(limit).getMany();
  }

  private async acknowledgers(): Promise<string[]> {
    const rows = await this.dataSource
      .getRepository(TriggerEntity)
      .createQueryBuilder("t")
      .select("DISTINCT t.acknowledged_by", "who")
      .where({ acknowledgedBy: Not(IsNull()) })
      .orderBy("who", "ASC")
      .getRawMany<{ who: string }>();
    return rows.map((r) => r.who);
  }

  private async withFigures(rows: TriggerEntity[]): Promise<HistoryTriggerDto[]> {
    const summaries = await this.triggers.summaries(rows);
    const extras = await this.extras(rows.map((r) => r.id));
    return summaries.map((s) => figuresOf(s, extras));
  }

  private async extras(ids: number[]): Promise<TriggerExtras> {
    const escalations = new Map<number, number>();
    for (const part of chunks(ids)) {
      const counts = await this.dataSource
        .getRepository(TriggerEventEntity)
        .createQueryBuilder("e")
        .select("e.trigger_id", "triggerId")
        .addSelect("COUNT(*)", "count")
        .where({ kind: "escalated", triggerId: In(part) })
        .groupBy("e.trigger_id")
        .getRawMany<{ triggerId: number; count: number }>();
      for (const c of counts) escalations.set(Number(c.triggerId), Number(c.count));
    }
    return { escalations, notifications: await this.notificationsFor(ids) };
  }

  /** Outbox rows about each trigger: its own messages, and digests that listed it. */
  private async notificationsFor(ids: number[]): Promise<Map<number, NotificationEntity[]>> {
    const out = new Map<number, NotificationEntity[]>();
    if (ids.length === 0) return out;
    const repo = this.dataSource.getRepository(NotificationEntity);
    const add = (id: number, n: NotificationEntity) => out.set(id, [...(out.get(id) ?? []), n]);
    for (const part of chunks(ids)) for (const n of await repo.find({ where: { triggerId: In(part) }, order: { id: "ASC" } })) add(n.triggerId!, n);
    const wanted = new Set(ids);
    for (const digest of await repo.find({ where: { triggerId: IsNull() }, order: { id: "ASC" } })) {
      for (const id of digest.triggerIds ?? []) if (wanted.has(id)) add(id, digest);
    }
    return out;
  }
}

function figuresOf(summary: TriggerSummaryDto, extras: TriggerExtras): HistoryTriggerDto {
  const notifications = extras.notifications.get(summary.id) ?? [];
  return {
    ...summary,
    minutesToAcknowledge: summary.acknowledgedAt ? minutesBetween(summary.openedAt, summary.acknowledgedAt) : null,
    escalations: extras.escalations.get(summary.id) ?? 0,
    notificationsSent: notifications.filter((n) => n.state === "sent").length,
    notificationsFailed: notifications.filter((n) => n.state === "failed").length,
  };
}

/** The figures a post-event review starts from, over the triggers shown. */
export function summarise(triggers: readonly HistoryTriggerDto[]): HistorySummaryDto {
  const byRule = new Map<number, { ruleId: number; ruleName: string; count: number }>();
  for (const t of triggers) {
    const entry = byRule.get(t.rule.id) ?? { ruleId: t.rule.id, ruleName: t.rule.name, count: 0 };
    entry.count += 1;
    byRule.set(t.rule.id, entry);
  }
  const ackMinutes = triggers.flatMap((t) => (t.minutesToAcknowledge === null ? [] : [t.minutesToAcknowledge]));
  return {
    triggers: triggers.length,
    byRule: [...byRule.values()].sort((a, b) => b.count - a.count || a.ruleName.localeCompare(b.ruleName)),
    byState: TRIGGER_STATES.map((state) => ({ state, count: triggers.filter((t) => t.state === state).length })),
    acknowledged: ackMinutes.length,
    minutesToAcknowledge: medianAndP90(ackMinutes),
    escalations: triggers.reduce((sum, t) => sum + t.escalations, 0),
    notificationFailures: triggers.reduce((sum, t) => sum + t.notificationsFailed, 0),
    notificationsSent: triggers.reduce((sum, t) => sum + t.notificationsSent, 0),
  };
}

function toNotificationDto(n: NotificationEntity, attempts: DeliveryAttemptEntity[]): HistoryNotificationDto {
  return {
    id: n.id,
    channel: n.channel,
    recipient: n.recipientName,
    address: n.address,
    change: n.change,
    level: n.level,
    state: n.state,
    attempts: n.attempts,
    createdAt: n.createdAt,
    sentAt: n.sentAt,
    lastError: n.lastError,
    deliveries: attempts.map((a) => ({ attempt: a.attempt, outcome: a.outcome, startedAt: a.startedAt, finishedAt: a.finishedAt, error: a.error })),
  };
}
