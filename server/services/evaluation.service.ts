import type { DataSource, EntityManager } from "typeorm";
import { In, MoreThan } from "typeorm";
import PQueue from "p-queue";
import type { Logger } from "pino";
import { findPersistentRuns, isWithinValidTimeWindow, type MatchSummary } from "../../shared/rules/index.ts";
import type { RuleDefinition } from "../../shared/api/rules.ts";
import { ACTIVE_TRIGGER_STATES } from "../../shared/api/triggers.ts";
import { GridFrameEntity } from "../entities/grid-frame.entity.ts";
import { RuleEvaluationEntity } from "../entities/rule-evaluation.entity.ts";
import { TriggerEntity } from "../entities/trigger.entity.ts";
import type { RuleEntity } from "../entities/rule.entity.ts";
import type { RuleVersionEntity } from "../entities/rule-version.entity.ts";
import { appendAudit, SYSTEM_ACTOR } from "../audit/audit-log.ts";
import { writeTransaction } from "../db/data-source.ts";
import { FrameFields } from "../rules/frame-fields.ts";
import { evaluateVersionOnFrame, type ZoneOutcome } from "../rules/evaluate-version.ts";
import { decideTrigger, type TriggerDecision } from "../rules/trigger-decision.ts";
import type { RuleService } from "./rule.service.ts";
import type { ZoneService } from "./zone.service.ts";
import { EMPTY_PEAK, mergePeak, type TriggerService } from "./trigger.service.ts";
import type { TriggerNotifier } from "./trigger-notifier.ts";

/** Largest step between valid times that still counts as "consecutive" for persistence. */
const PERSISTENCE_MAX_GAP_HOURS = 3;

export interface EvaluationDeps {
  dataSource: DataSource;
  dataDir: string;
  rules: RuleService;
  zones: ZoneService;
  triggers: TriggerService;
  notifier: TriggerNotifier;
  logger: Logger;
  now?: () => Date;
}

/**
 * Checks every enabled rule against each ready frame (one frame at a time, in arrival order) and
 * turns matches into triggers. Every step is keyed, so a frame evaluated twice changes nothing.
 */
export class EvaluationService {
  private readonly queue = new PQueue({ concurrency: 1 });
  private readonly queued = new Set<number>();

  constructor(private readonly deps: EvaluationDeps) {}

  private now(): Date {
    return this.deps.now?.() ?? new Date();
  }

  enqueue(frameId: number): void {
    if (this.queued.has(frameId)) return;
    this.queued.add(frameId);
    void this.queue.add(async () => {
      this.queued.delete(frameId);
      try {
        await this.evaluateFrame(frameId);
      } catch (err) {
        this.deps.logger.error({ err, frameId }, "rule evaluation failed");
      }
    });
  }

  idle(): Promise<void> {
    return this.queue.onIdle();
  }

  async stop(): Promise<void> {
    this.queue.clear();
    await this.queue.onIdle();
  }

  /** Re-queues frames of the last `hours` whose evaluation by a current rule version is missing. */
  async recheckRecent(hours: number): Promise<number> {
    const since = new Date(this.now().getTime() - hours * 3_600_000).toISOString();
    const frames = await this.deps.dataSource.getRepository(GridFrameEntity).find({ where: { createdAt: MoreThan(since) }, order: { validTime: "ASC" } });
    const active = await this.deps.rules.activeVersions();
    if (frames.length === 0 || active.length === 0) return 0;
    // One query for every (version, frame) pair already evaluated, instead of one per pair.
    const done = await this.deps.dataSource.getRepository(RuleEvaluationEntity).find({
      where: { frameId: In(frames.map((f) => f.id)), ruleVersionId: In(active.map((a) => a.version.id)) },
      select: { frameId: true, ruleVersionId: true },
    });
    const evaluated = new Set(done.map((e) => `${e.ruleVersionId}|${e.frameId}`));
    let count = 0;
    for (const frame of frames) {
      // A version whose valid-time window leaves the frame out never evaluates it: not missing.
      const due = active.filter(({ definition }) => isWithinValidTimeWindow(definition.validTimeWindow, { runTime: frame.runTime, validTime: frame.validTime }));
      if (due.some(({ version }) => !evaluated.has(`${version.id}|${frame.id}`))) {
        this.enqueue(frame.id);
        count++;
      }
    }
    return count;
  }

  async evaluateFrame(frameId: number): Promise<void> {
    const frame = await this.deps.dataSource.getRepository(GridFrameEntity).findOne({ where: { id: frameId } });
    if (!frame) return; // replaced or pruned since it was queued
    const fields = new FrameFields(this.deps.dataSource, this.deps.dataDir, frame);
    for (const { rule, version, definition } of await this.deps.rules.activeVersions()) {
      if (!isWithinValidTimeWindow(definition.validTimeWindow, { runTime: frame.runTime, validTime: frame.validTime })) continue;
      const masks = await Promise.all(definition.zoneIds.map(async (zoneId) => ({ zoneId, mask: await this.deps.zones.maskFor(zoneId, fields.geometry) })));
      const outcome = await evaluateVersionOnFrame(`v${version.id}`, definition, fields, masks);
      for (const zone of outcome.zones) await this.record(rule, version, definition, frame, zone);
    }
  }

  /** Stores one zone's evaluation and applies the trigger decision, in one transaction. */
  private async record(rule: RuleEntity, version: RuleVersionEntity, definition: RuleDefinition, frame: GridFrameEntity, zone: ZoneOutcome): Promise<void> {
    await writeTransaction(this.deps.dataSource, async (m) => {
      const evaluations = m.getRepository(RuleEvaluationEntity);
      if (await evaluations.exists({ where: { ruleVersionId: version.id, zoneId: zone.zoneId, frameId: frame.id } })) return;
      const evaluation = await evaluations.save(
        evaluations.create({
          ruleId: rule.id,
          ruleVersionId: version.id,
          zoneId: zone.zoneId,
          frameId: frame.id,
          model: frame.model,
          runTime: frame.runTime,
          validTime: frame.validTime,
          met: zone.met,
          summary: JSON.stringify(zone.summary),
          reason: zone.reason.slice(0, 400),
          triggerId: null,
          evaluatedAt: this.now().toISOString(),
        }),
      );
      const decision = decideTrigger({
        ruleId: rule.id,
        zoneId: zone.zoneId,
        severity: definition.severity,
        coolDownHours: definition.coolDownHours,
        result: { runTime: frame.runTime, validTime: frame.validTime, met: zone.met, qualifyingStreak: zone.met ? await this.streak(m, version, zone.zoneId, frame, definition.persistenceFrames) : null },
        active: (await m.getRepository(TriggerEntity).find({ where: { ruleId: rule.id, zoneId: zone.zoneId, state: In([...ACTIVE_TRIGGER_STATES]), model: frame.model } })).map((t) => ({
          ...t,
          matchedValidTimes: JSON.parse(t.matchedValidTimes) as string[],
        })),
        lastClosed: await m.getRepository(TriggerEntity).findOne({ where: { ruleId: rule.id, zoneId: zone.zoneId, state: In(["cleared", "expired", "false-alarm"]) }, order: { lastValidTime: "DESC" } }),
      });
      await this.apply(m, decision, { rule, version, definition, frame, zone, evaluation });
    });
  }

  /** The streak of met frames (this version, zone and run) holding this frame, if at least K long. */
  private async streak(m: EntityManager, version: RuleVersionEntity, zoneId: number, frame: GridFrameEntity, k: number): Promise<string[] | null> {
    if (k <= 1) return [frame.validTime];
    const rows = await m.getRepository(RuleEvaluationEntity).find({
      where: { ruleVersionId: version.id, zoneId, runTime: frame.runTime, model: frame.model },
      order: { validTime: "ASC" },
      select: { validTime: true, met: true },
    });
    const result = findPersistentRuns(rows, k, { maxGapHours: PERSISTENCE_MAX_GAP_HOURS });
    const run = result.runs.find((r) => r.some((f) => f.validTime === frame.validTime));
    return run ? run.map((f) => f.validTime) : null;
  }

  private async apply(
    m: EntityManager,
    decision: TriggerDecision,
    ctx: { rule: RuleEntity; version: RuleVersionEntity; definition: RuleDefinition; frame: GridFrameEntity; zone: ZoneOutcome; evaluation: RuleEvaluationEntity },
  ): Promise<void> {
    const triggers = m.getRepository(TriggerEntity);
    const now = this.now().toISOString();
    const summary = ctx.zone.summary as MatchSummary;
    const link = (triggerId: number) => m.getRepository(RuleEvaluationEntity).update({ id: ctx.evaluation.id }, { triggerId });
    switch (decision.action) {
      case "open": {
        // Different models are separate events for the same rule and zone.
        const triggerKey = `${decision.key}|${ctx.frame.model}`;
        if (await triggers.exists({ where: { triggerKey } })) return;
        const trigger = await triggers.save(
          triggers.create({
            triggerKey,
            ruleId: ctx.rule.id,
            ruleVersionId: ctx.version.id,
            zoneId: ctx.zone.zoneId,
            severity: ctx.definition.severity,
            state: "open",
            model: ctx.frame.model,
            runTime: ctx.frame.runTime,
            firstValidTime: decision.firstValidTime,
            lastValidTime: decision.lastValidTime,
            matchedValidTimes: JSON.stringify(decision.matchedValidTimes),
            peak: JSON.stringify(mergePeak(EMPTY_PEAK, summary)),
            openedAt: now,
            updatedAt: now,
            acknowledgedBy: null,
            acknowledgedAt: null,
            closedAt: null,
            closedBy: null,
            closeReason: null,
          }),
        );
        // Earlier frames of the streak belong to the trigger too.
        await m.getRepository(RuleEvaluationEntity).update(
          { ruleVersionId: ctx.version.id, zoneId: ctx.zone.zoneId, runTime: ctx.frame.runTime, validTime: In(decision.matchedValidTimes) },
          { triggerId: trigger.id },
        );
        await this.deps.triggers.addEvent(m, trigger, "opened", null, decision.reason, { ruleVersion: ctx.version.version, frameId: ctx.frame.id });
        await appendAudit(m, SYSTEM_ACTOR, { action: "trigger.opened", targetType: "trigger", targetId: trigger.id, after: { key: triggerKey, ruleVersionId: ctx.version.id, zoneId: ctx.zone.zoneId, severity: trigger.severity } });
        await this.deps.notifier.onTriggerChange(m, trigger, "opened");
        return;
      }
      case "extend": {
        const trigger = await triggers.findOneByOrFail({ id: decision.triggerId });
        await link(trigger.id);
        if (!decision.changed) return;
        Object.assign(trigger, {
          firstValidTime: decision.firstValidTime,
          lastValidTime: decision.lastValidTime,
          matchedValidTimes: JSON.stringify(decision.matchedValidTimes),
          runTime: decision.runTime,
          peak: JSON.stringify(mergePeak(JSON.parse(trigger.peak), summary)),
          updatedAt: now,
          ...(decision.severityRose ? { severity: ctx.definition.severity } : {}),
        });
        await triggers.save(trigger);
        await this.deps.triggers.addEvent(m, trigger, "updated", null, decision.reason, { ruleVersion: ctx.version.version, frameId: ctx.frame.id, severityRose: decision.severityRose });
        if (decision.severityRose) await this.deps.notifier.onTriggerChange(m, trigger, "severity-rose");
        return;
      }
      case "retract": {
        const trigger = await triggers.findOneByOrFail({ id: decision.triggerId });
        await link(trigger.id);
        trigger.matchedValidTimes = JSON.stringify(decision.matchedValidTimes);
        trigger.runTime = ctx.frame.runTime;
        trigger.updatedAt = now;
        if (decision.clear) {
          const before = trigger.state;
          Object.assign(trigger, { state: "cleared", closedAt: now, closeReason: decision.reason });
          await triggers.save(trigger);
          await this.deps.triggers.addEvent(m, trigger, "cleared", null, decision.reason, { frameId: ctx.frame.id });
          await appendAudit(m, SYSTEM_ACTOR, { action: "trigger.cleared", targetType: "trigger", targetId: trigger.id, before: { state: before }, after: { state: "cleared" } });
        } else {
          await triggers.save(trigger);
          await this.deps.triggers.addEvent(m, trigger, "updated", null, decision.reason, { frameId: ctx.frame.id });
        }
        return;
      }
      case "suppress":
        // Keep the reason with the evaluation, so the trigger history shows why nothing opened.
        await m.getRepository(RuleEvaluationEntity).update({ id: ctx.evaluation.id }, { reason: `${ctx.zone.reason} ${decision.reason}`.slice(0, 400) });
        return;
      case "none":
        return;
    }
  }
}
