import type { DataSource } from "typeorm";
import { In } from "typeorm";
import { parseRule } from "../../shared/rules/index.ts";
import type { BacktestInput, PreviewInput, RuleDefinition } from "../../shared/api/rules.ts";
import { encodeMaskBits } from "../../shared/grid/mask-bits.ts";
import { GridFrameEntity } from "../entities/grid-frame.entity.ts";
import { ModelRunEntity } from "../entities/model-run.entity.ts";
import { RuleVersionEntity } from "../entities/rule-version.entity.ts";
import { TriggerEntity } from "../entities/trigger.entity.ts";
import { AppError, NotFoundError } from "../errors.ts";
import type { RuleService } from "../services/rule.service.ts";
import type { ZoneService } from "../services/zone.service.ts";
import { FrameFields } from "./frame-fields.ts";
import { evaluateVersionOnFrame, type VersionOutcome } from "./evaluate-version.ts";
import { decideTrigger, type ActiveTriggerView, type ClosedTriggerView } from "./trigger-decision.ts";
import { findPersistentRuns } from "../../shared/rules/index.ts";

const frameSummary = (f: GridFrameEntity) => ({ id: f.id, model: f.model, runTime: f.runTime, validTime: f.validTime, forecastHour: f.forecastHour });

/** Maps of where rules match: the editor's preview, backtests, and a trigger's matched area. */
export class RuleMapService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly dataDir: string,
    private readonly rules: RuleService,
    private readonly zones: ZoneService,
  ) {}

  private async outcome(cacheKey: string, definition: Pick<RuleDefinition, "expression" | "spatialCondition">, frame: GridFrameEntity, zoneIds: readonly number[]) {
    const fields = new FrameFields(this.dataSource, this.dataDir, frame);
    const masks = await Promise.all(zoneIds.map(async (zoneId) => ({ zoneId, mask: await this.zones.maskFor(zoneId, fields.geometry) })));
    const outcome = await evaluateVersionOnFrame(cacheKey, definition, fields, masks);
    return { outcome, masks, geometry: fields.geometry };
  }

  /** Where an expression (not yet saved) matches on a frame, the newest one unless named. */
  async preview(input: PreviewInput) {
    const parsed = parseRule(input.expression);
    if (!parsed.ok) throw new AppError(422, "EXPRESSION_INVALID", parsed.errors[0]!.message, { errors: parsed.errors });
    const frames = this.dataSource.getRepository(GridFrameEntity);
    const frame = input.frameId ? await frames.findOne({ where: { id: input.frameId } }) : (await frames.find({ order: { runTime: "DESC", validTime: "DESC" }, take: 1 }))[0];
    if (!frame) throw new NotFoundError(input.frameId ? `Frame ${input.frameId}` : "A stored frame to preview on");
    const { outcome, geometry } = await this.outcome(`preview:${parsed.rule.normalised}`, input, frame, input.zoneIds);
    return { frame: frameSummary(frame), geometry, missingFields: outcome.missingFields, mask: outcome.met ? encodeMaskBits(outcome.met) : null, zones: outcome.zones };
  }

  /** The matched area of one frame of a trigger, inside its zone. */
  async triggerMask(triggerId: number, frameId: number) {
    const trigger = await this.dataSource.getRepository(TriggerEntity).findOne({ where: { id: triggerId } });
    if (!trigger) throw new NotFoundError(`Trigger ${triggerId}`);
    const frame = await this.dataSource.getRepository(GridFrameEntity).findOne({ where: { id: frameId } });
    if (!frame) throw new NotFoundError(`Frame ${frameId}`);
    const version = await this.dataSource.getRepository(RuleVersionEntity).findOneByOrFail({ id: trigger.ruleVersionId });
    const definition = JSON.parse(version.definition) as RuleDefinition;
    const { outcome, masks, geometry } = await this.outcome(`v${version.id}`, definition, frame, [trigger.zoneId]);
    const inZone = outcome.met ? outcome.met.map((v, i) => v & masks[0]!.mask[i]!) : null;
    return { frame: frameSummary(frame), geometry, mask: inZone ? encodeMaskBits(inZone) : null, zone: outcome.zones[0] ?? null, missingFields: outcome.missingFields };
  }

  /**
   * A rule version over the stored frames of the last N runs, notifying no one: per frame and
   * zone whether it matched, a small map, and the triggers it would have opened after
   * persistence and cool-down.
   */
  async backtest(ruleId: number, input: BacktestInput) {
    const rule = await this.rules.find(ruleId, true);
    const version = await this.rules.version(input.versionId ?? rule.currentVersionId!);
    if (version.ruleId !== ruleId) throw new NotFoundError(`Version ${version.id} of rule ${ruleId}`);
    const definition = JSON.parse(version.definition) as RuleDefinition;
    const runs = await this.dataSource.getRepository(ModelRunEntity).find({ order: { runTime: "DESC" }, take: input.runs });
    const frames = runs.length
      ? await this.dataSource.getRepository(GridFrameEntity).find({ where: { runId: In(runs.map((r) => r.id)) }, order: { runTime: "ASC", validTime: "ASC" } })
      : [];
    const results = [];
    // Simulated trigger state per zone, exactly as the live engine would keep it.
    const active = new Map<number, ActiveTriggerView[]>();
    const closed = new Map<number, ClosedTriggerView>();
    const history = new Map<string, Array<{ validTime: string; met: boolean }>>();
    const opened: Array<{ zoneId: number; firstValidTime: string; runTime: string }> = [];
    let nextId = 1;
    for (const frame of frames) {
      const { outcome, masks } = await this.outcome(`v${version.id}`, definition, frame, definition.zoneIds);
      const union = this.unionMask(outcome, masks);
      const zones = [];
      for (const zone of outcome.zones) {
        const key = `${zone.zoneId}|${frame.model}|${frame.runTime}`;
        const list = history.get(key) ?? [];
        list.push({ validTime: frame.validTime, met: zone.met });
        history.set(key, list);
        const persistent = findPersistentRuns(list, definition.persistenceFrames, { maxGapHours: 3 }).runs.find((r) => r.some((f) => f.validTime === frame.validTime));
        const decision = decideTrigger({
          ruleId,
          zoneId: zone.zoneId,
          severity: definition.severity,
          coolDownHours: definition.coolDownHours,
          result: { runTime: frame.runTime, validTime: frame.validTime, met: zone.met, qualifyingStreak: zone.met && persistent ? persistent.map((f) => f.validTime) : null },
          active: active.get(zone.zoneId) ?? [],
          lastClosed: closed.get(zone.zoneId) ?? null,
        });
        if (decision.action === "open") {
          opened.push({ zoneId: zone.zoneId, firstValidTime: decision.firstValidTime, runTime: frame.runTime });
          active.set(zone.zoneId, [...(active.get(zone.zoneId) ?? []), { id: nextId++, severity: definition.severity, runTime: frame.runTime, firstValidTime: decision.firstValidTime, lastValidTime: decision.lastValidTime, matchedValidTimes: decision.matchedValidTimes }]);
        } else if (decision.action === "extend") {
          active.set(zone.zoneId, (active.get(zone.zoneId) ?? []).map((t) => (t.id === decision.triggerId ? { ...t, ...decision } : t)));
        } else if (decision.action === "retract") {
          const list2 = (active.get(zone.zoneId) ?? []).map((t) => (t.id === decision.triggerId ? { ...t, matchedValidTimes: decision.matchedValidTimes } : t));
          if (decision.clear) {
            const gone = list2.find((t) => t.id === decision.triggerId)!;
            closed.set(zone.zoneId, { severity: gone.severity, lastValidTime: gone.lastValidTime });
          }
          active.set(zone.zoneId, list2.filter((t) => !(decision.clear && t.id === decision.triggerId)));
        }
        zones.push({ zoneId: zone.zoneId, met: zone.met, reason: zone.reason, coveragePercent: zone.summary.coveragePercent, matchedPoints: zone.summary.matchedPoints, decision: decision.action });
      }
      results.push({ frame: frameSummary(frame), zones, mask: union ? encodeMaskBits(union) : null, missingFields: outcome.missingFields });
    }
    const geometry = frames[0] ? JSON.parse(frames[0].geometry) : null;
    return { ruleId, versionId: version.id, version: version.version, geometry, frames: results, wouldOpen: opened.length, opened };
  }

  /** Met points inside any of the rule's zones. */
  private unionMask(outcome: VersionOutcome, masks: Array<{ zoneId: number; mask: Uint8Array }>): Uint8Array | null {
    if (!outcome.met) return null;
    const out = new Uint8Array(outcome.met.length);
    for (const { mask } of masks) for (let i = 0; i < out.length; i++) out[i]! |= outcome.met[i]! & mask[i]!;
    return out;
  }
}
