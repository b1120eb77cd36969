import type { DataSource, EntityManager } from "typeorm";
import { In, LessThan, Not } from "typeorm";
import {
  ACTIVE_TRIGGER_STATES,
  type TimelineEntryDto,
  type TriggerDetailDto,
  type TriggerEventKind,
  type TriggersQuery,
  type TriggerSummaryDto,
} from "../../shared/api/triggers.ts";
import type { RuleDefinition } from "../../shared/api/rules.ts";
import type { MatchSummary } from "../../shared/rules/index.ts";
import { TriggerEntity } from "../entities/trigger.entity.ts";
import { TriggerEventEntity } from "../entities/trigger-event.entity.ts";
import { RuleEntity } from "../entities/rule.entity.ts";
import { RuleVersionEntity } from "../entities/rule-version.entity.ts";
import { RuleEvaluationEntity } from "../entities/rule-evaluation.entity.ts";
import { ZoneEntity } from "../entities/zone.entity.ts";
import { IngestJobEntity } from "../entities/ingest-job.entity.ts";
import { StormReportEntity } from "../entities/storm-report.entity.ts";
import { toStormReportDto } from "../storm-reports/storm-report.service.ts";
import { appendAudit, SYSTEM_ACTOR, type AuditActor } from "../audit/audit-log.ts";
import { writeTransaction } from "../db/data-source.ts";
import { ConflictError, NotFoundError } from "../errors.ts";
import type { EventBus } from "../realtime/event-bus.ts";

interface Peak {
  coveragePercent: number | null;
  matchedPoints: number;
  fields: Array<{ key: string; max: number | null; min: number | null; mean: number | null }>;
}

export const EMPTY_PEAK: Peak = { coveragePercent: null, matchedPoints: 0, fields: [] };

/** The larger of two peaks, field by field. */
export function mergePeak(peak: Peak, summary: MatchSummary): Peak {
  const fields = new Map(peak.fields.map((f) => [f.key, { ...f }]));
  for (const f of summary.fields) {
    const old = fields.get(f.key);
    const pick = (a: number | null | undefined, b: number | null, better: (x: number, y: number) => number) => (a === null || a === undefined ? b : b === null ? a : better(a, b));
    fields.set(f.key, { key: f.key, max: pick(old?.max, f.max, Math.max), min: pick(old?.min, f.min, Math.min), mean: pick(old?.mean, f.mean, Math.max) });
  }
  return {
    coveragePercent: summary.coveragePercent === null ? peak.coveragePercent : Math.max(peak.coveragePercent ?? 0, summary.coveragePercent),
    matchedPoints: Math.max(peak.matchedPoints, summary.matchedPoints),
    fields: [...fields.values()],
  };
}

/** Triggers: their states and events, the forecaster's actions on them, and the timeline. */
export class TriggerService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly events: EventBus,
    private readonly now: () => Date = () => new Date(),
  ) {}

  /** Appends an event row (inside the caller's transaction) and announces it after commit. */
  async addEvent(m: EntityManager, trigger: TriggerEntity, kind: TriggerEventKind, actor: string | null, note: string | null, data?: unknown): Promise<void> {
    await m.getRepository(TriggerEventEntity).save({ triggerId: trigger.id, kind, at: this.now().toISOString(), actor, note, data: data === undefined ? null : JSON.stringify(data) });
    this.announce(trigger, kind);
  }

  announce(trigger: Pick<TriggerEntity, "id" | "state" | "severity">, kind: string): void {
    // Emitted at once; the client refetches, and a rolled-back write simply shows no change.
    setImmediate(() => this.events.emit("trigger.changed", { triggerId: trigger.id, kind, state: trigger.state, severity: trigger.severity }));
  }

  async list(query: TriggersQuery): Promise<TriggerSummaryDto[]> {
    const where: Record<string, unknown> = {};
    if (query.state) where.state = query.state;
    if (query.active === "true") where.state = In([...ACTIVE_TRIGGER_STATES]);
    if (query.active === "false") where.state = Not(In([...ACTIVE_TRIGGER_STATES]));
    if (query.severity) where.severity = query.severity;
    if (query.zoneId) where.zoneId = query.zoneId;
    if (query.ruleId) where.ruleId = query.ruleId;
    if (query.beforeId) where.id = LessThan(query.beforeId);
    const rows = await this.dataSource.getRepository(TriggerEntity).find({ where, order: { id: "DESC" }, take: query.limit });
    return this.summaries(rows);
  }

  async detail(id: number): Promise<TriggerDetailDto> {
    const trigger = await this.find(id);
    const [summary] = await this.summaries([trigger]);
    const version = await this.dataSource.getRepository(RuleVersionEntity).findOneByOrFail({ id: trigger.ruleVersionId });
    const zone = await this.dataSource.getRepository(ZoneEntity).findOneByOrFail({ id: trigger.zoneId });
    const evaluations = await this.dataSource.getRepository(RuleEvaluationEntity).find({ where: { triggerId: id }, order: { validTime: "ASC", runTime: "ASC" } });
    const events = await this.dataSource.getRepository(TriggerEventEntity).find({ where: { triggerId: id }, order: { id: "ASC" } });
    return {
      ...summary!,
      definition: JSON.parse(version.definition) as RuleDefinition,
      zoneGeometry: JSON.parse(zone.geometry),
      frames: evaluations.map((e) => {
        const s = JSON.parse(e.summary) as MatchSummary;
        return {
          evaluationId: e.id,
          frameId: e.frameId,
          runTime: e.runTime,
          validTime: e.validTime,
          met: e.met,
          reason: e.reason,
          matchedPoints: s.matchedPoints,
          zonePoints: s.zonePoints,
          coveragePercent: s.coveragePercent,
          fields: s.fields.map((f) => ({ key: f.key, max: f.max, min: f.min, mean: f.mean })),
        };
      }),
      events: events.map((e) => ({ id: e.id, kind: e.kind, at: e.at, actor: e.actor, note: e.note, data: e.data ? (JSON.parse(e.data) as unknown) : null })),
    };
  }

  async acknowledge(actor: AuditActor, id: number, note: string | undefined): Promise<TriggerDetailDto> {
    await writeTransaction(this.dataSource, async (m) => {
      const trigger = await this.findIn(m, id);
      if (trigger.state !== "open") throw new ConflictError(trigger.state === "acknowledged" ? `Trigger ${id} was already acknowledged by ${trigger.acknowledgedBy}.` : `Trigger ${id} is ${trigger.state}; only open triggers can be acknowledged.`);
      const at = this.now().toISOString();
      Object.assign(trigger, { state: "acknowledged", acknowledgedBy: actor.username, acknowledgedAt: at, updatedAt: at });
      await m.getRepository(TriggerEntity).save(trigger);
      await this.addEvent(m, trigger, "acknowledged", actor.username, note ?? null);
      await appendAudit(m, actor, { action: "trigger.acknowledged", targetType: "trigger", targetId: id, before: { state: "open" }, after: { state: "acknowledged", note: note ?? null } });
    });
    return this.detail(id);
  }

  async comment(actor: AuditActor, id: number, text: string): Promise<TriggerDetailDto> {
    await writeTransaction(this.dataSource, async (m) => {
      const trigger = await this.findIn(m, id);
      await this.addEvent(m, trigger, "commented", actor.username, text);
      await appendAudit(m, actor, { action: "trigger.commented", targetType: "trigger", targetId: id, after: { text } });
    });
    return this.detail(id);
  }

  async closeAsFalseAlarm(actor: AuditActor, id: number, reason: string): Promise<TriggerDetailDto> {
    await writeTransaction(this.dataSource, async (m) => {
      const trigger = await this.findIn(m, id);
      if (!ACTIVE_TRIGGER_STATES.includes(trigger.state)) throw new ConflictError(`Trigger ${id} is already ${trigger.state}.`);
      const before = trigger.state;
      const at = this.now().toISOString();
      Object.assign(trigger, { state: "false-alarm", closedAt: at, closedBy: actor.username, closeReason: reason, updatedAt: at });
      await m.getRepository(TriggerEntity).save(trigger);
      await this.addEvent(m, trigger, "false-alarm", actor.username, reason);
      await appendAudit(m, actor, { action: "trigger.false_alarm", targetType: "trigger", targetId: id, before: { state: before }, after: { state: "false-alarm", reason } });
    });
    return this.detail(id);
  }

  /** Active triggers whose last valid time is more than `graceHours` past: their event is over. */
  async expireOld(graceHours = 1): Promise<number> {
    const cutoff = new Date(this.now().getTime() - graceHours * 3_600_000).toISOString();
    return writeTransaction(this.dataSource, async (m) => {
      const due = await m.getRepository(TriggerEntity).find({ where: { state: In([...ACTIVE_TRIGGER_STATES]), lastValidTime: LessThan(cutoff) } });
      for (const trigger of due) {
        const before = trigger.state;
        const at = this.now().toISOString();
        Object.assign(trigger, { state: "expired", closedAt: at, closeReason: "Its last valid time has passed.", updatedAt: at });
        await m.getRepository(TriggerEntity).save(trigger);
        await this.addEvent(m, trigger, "expired", null, "The last valid time of the event has passed.");
        await appendAudit(m, SYSTEM_ACTOR, { action: "trigger.expired", targetType: "trigger", targetId: trigger.id, before: { state: before }, after: { state: "expired" } });
      }
      return due.length;
    });
  }

  /** Triggers, grid arrivals, escalations and storm reports (at the time observed), newest first. */
  async timeline(limit: number, before?: string): Promise<TimelineEntryDto[]> {
    const cutoff = before ? new Date(before).toISOString() : "9999";
    const triggers = await this.dataSource.getRepository(TriggerEntity).find({ where: { openedAt: LessThan(cutoff) }, order: { openedAt: "DESC" }, take: limit });
    const jobs = await this.dataSource.getRepository(IngestJobEntity).find({ where: { finishedAt: LessThan(cutoff) }, order: { finishedAt: "DESC" }, take: limit });
    const escalations = await this.dataSource.getRepository(TriggerEventEntity).find({ where: { kind: "escalated", at: LessThan(cutoff) }, order: { at: "DESC" }, take: limit });
    // A report joins the timeline when its time has come (the demo places invented ones on the run's clock).
    const reportCutoff = [cutoff, this.now().toISOString()].sort()[0]!;
    const reports = await this.dataSource.getRepository(StormReportEntity).find({ where: { time: LessThan(reportCutoff) }, order: { time: "DESC" }, take: limit });
    const entries: TimelineEntryDto[] = [
      ...(await this.summaries(triggers)).map((t) => ({ kind: "trigger" as const, at: t.openedAt, trigger: t })),
      ...jobs.map((j) => ({ kind: "grid" as const, at: j.finishedAt!, jobId: j.id, name: j.originalName, state: j.state, frameCount: j.frameCount, reason: j.failureReason })),
      ...escalations.map((e) => ({ kind: "escalation" as const, at: e.at, triggerId: e.triggerId, note: e.note })),
      ...reports.map((r) => ({ kind: "report" as const, at: r.time, report: toStormReportDto(r) })),
    ];
    return entries.sort((a, b) => b.at.localeCompare(a.at)).slice(0, limit);
  }

  async find(id: number): Promise<TriggerEntity> {
    return this.findIn(this.dataSource.manager, id);
  }

  private async findIn(m: EntityManager, id: number): Promise<TriggerEntity> {
    const trigger = await m.getRepository(TriggerEntity).findOne({ where: { id } });
    if (!trigger) throw new NotFoundError(`Trigger ${id}`);
    return trigger;
  }

  async summaries(rows: TriggerEntity[]): Promise<TriggerSummaryDto[]> {
    if (rows.length === 0) return [];
    const rules = await this.dataSource.getRepository(RuleEntity).find({ where: { id: In([...new Set(rows.map((r) => r.ruleId))]) } });
    const versions = await this.dataSource.getRepository(RuleVersionEntity).find({ where: { id: In([...new Set(rows.map((r) => r.ruleVersionId))]) } });
    const zones = await this.dataSource.getRepository(ZoneEntity).find({ where: { id: In([...new Set(rows.map((r) => r.zoneId))]) } });
    const trends = await this.trends(rows);
    return rows.map((t) => {
      const rule = rules.find((r) => r.id === t.ruleId);
      const version = versions.find((v) => v.id === t.ruleVersionId);
      const zone = zones.find((z) => z.id === t.zoneId);
      return {
        id: t.id,
        state: t.state,
        severity: t.severity,
        rule: { id: t.ruleId, name: rule?.name ?? `rule ${t.ruleId}`, versionId: t.ruleVersionId, version: version?.version ?? 0 },
        zone: { id: t.zoneId, code: zone?.code ?? "?", name: zone?.name ?? `zone ${t.zoneId}` },
        model: t.model,
        runTime: t.runTime,
        firstValidTime: t.firstValidTime,
        lastValidTime: t.lastValidTime,
        openedAt: t.openedAt,
        updatedAt: t.updatedAt,
        acknowledgedBy: t.acknowledgedBy,
        acknowledgedAt: t.acknowledgedAt,
        closedAt: t.closedAt,
        closeReason: t.closeReason,
        peak: JSON.parse(t.peak) as Peak,
        trend: trends.get(t.id) ?? null,
      };
    });
  }

  /** Peak coverage of the newest run minus that of the run before it, per trigger. */
  private async trends(rows: TriggerEntity[]): Promise<Map<number, number>> {
    const evaluations = await this.dataSource.getRepository(RuleEvaluationEntity).find({ where: { triggerId: In(rows.map((r) => r.id)) }, select: { triggerId: true, runTime: true, summary: true } });
    const byTrigger = new Map<number, Map<string, number>>();
    for (const e of evaluations) {
      const coverage = (JSON.parse(e.summary) as MatchSummary).coveragePercent ?? 0;
      const runs = byTrigger.get(e.triggerId!) ?? new Map<string, number>();
      runs.set(e.runTime, Math.max(runs.get(e.runTime) ?? 0, coverage));
      byTrigger.set(e.triggerId!, runs);
    }
    const out = new Map<number, number>();
    for (const [id, runs] of byTrigger) {
      const ordered = [...runs.entries()].sort((a, b) => a[0].localeCompare(b[0]));
      if (ordered.length >= 2) out.set(id, ordered.at(-1)![1] - ordered.at(-2)![1]);
    }
    return out;
  }
}
