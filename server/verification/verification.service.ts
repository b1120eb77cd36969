import type { DataSource } from "typeorm";
import { In } from "typeorm";
import {
  DEFAULT_DISTANCE_KM,
  type CompareQuery,
  type MatchingOptionsDto,
  type ScoreRowDto,
  type VerificationDto,
  type VerificationQuery,
  type VersionComparisonDto,
} from "../../shared/api/verification.ts";
import type { RuleDefinition } from "../../shared/api/rules.ts";
import { STORM_REPORT_KINDS } from "../../shared/storm-reports/storm-report-kinds.ts";
import type { ZoneGeometry } from "../../shared/zones/zone-geometry.ts";
import { matchReportsToTriggers, type MatchResult, type TriggerToMatch } from "../../shared/verification/match-reports.ts";
import { anySetWithinKm } from "../../shared/verification/matched-points.ts";
import { TriggerEntity } from "../entities/trigger.entity.ts";
import { RuleEntity } from "../entities/rule.entity.ts";
import { RuleVersionEntity } from "../entities/rule-version.entity.ts";
import { ZoneEntity } from "../entities/zone.entity.ts";
import type { StormReportEntity } from "../entities/storm-report.entity.ts";
import { NotFoundError } from "../errors.ts";
import type { RuleService } from "../services/rule.service.ts";
import type { ZoneService } from "../services/zone.service.ts";
import type { RuleMapService } from "../rules/rule-map.service.ts";
import type { StormReportService } from "../storm-reports/storm-report.service.ts";
import { toStormReportDto } from "../storm-reports/storm-report.service.ts";
import { ReportZoneDistances } from "./report-space.ts";
import { scoreCounts, scoreMatch, type ScoredMatch } from "./score-row.ts";
import { TriggerAreas } from "./trigger-areas.ts";
import { compareVersions } from "./compare-versions.ts";

const HOUR_MS = 3_600_000;

export function resolveOptions(q: Pick<VerificationQuery, "space" | "distanceKm" | "windowHours" | "kinds">): MatchingOptionsDto {
  return { space: q.space, distanceKm: q.distanceKm ?? DEFAULT_DISTANCE_KM[q.space], windowHours: q.windowHours, kinds: q.kinds && q.kinds.length > 0 ? q.kinds : [...STORM_REPORT_KINDS] };
}

interface VersionInfo {
  entity: RuleVersionEntity;
  zoneIds: number[];
  /** When it became current, and when the next version replaced it (null while current). */
  from: number;
  until: number | null;
}

const toMatchable = (t: TriggerEntity): TriggerToMatch => ({ id: t.id, openedAt: Date.parse(t.openedAt), firstValidTime: Date.parse(t.firstValidTime), lastValidTime: Date.parse(t.lastValidTime) });

/** Scores rules against storm reports: live triggers over a period, or two versions simulated over stored frames. */
export class VerificationService {
  private readonly areas: TriggerAreas;

  constructor(
    private readonly dataSource: DataSource,
    private readonly deps: { rules: RuleService; zones: ZoneService; maps: RuleMapService; reports: StormReportService },
  ) {
    this.areas = new TriggerAreas(dataSource, deps.maps);
  }

  async verify(q: VerificationQuery): Promise<VerificationDto> {
    const options = resolveOptions(q);
    const selectedVersion = q.ruleVersionId ? await this.deps.rules.version(q.ruleVersionId) : null;
    if (selectedVersion && q.ruleId && selectedVersion.ruleId !== q.ruleId) throw new NotFoundError(`Version ${selectedVersion.id} of rule ${q.ruleId}`);
    const ruleId = selectedVersion?.ruleId ?? q.ruleId ?? null;
    if (ruleId) await this.deps.rules.find(ruleId, true);

    // A chosen version is scored within its whole rule, so reports its siblings detected are not counted against it.
    const triggers = await this.triggersOverlapping(q.from, q.to, ruleId);
    const rules = await this.dataSource.getRepository(RuleEntity).find(ruleId ? { where: { id: ruleId } } : {});
    const ruleName = new Map(rules.map((r) => [r.id, r.name]));
    const versions = await this.versionInfo(rules.map((r) => r.id));
    const zoneIds = new Set([...triggers.map((t) => t.zoneId), ...[...versions.values()].flatMap((v) => v.zoneIds)]);
    const zones = await this.dataSource.getRepository(ZoneEntity).find({ where: { id: In([...zoneIds]) } });
    const distances = new ReportZoneDistances(new Map(zones.map((z) => [z.id, JSON.parse(z.geometry) as ZoneGeometry])));
    const reports = await this.deps.reports.find({ from: q.from, to: q.to, kinds: options.kinds });
    const near = await this.spaceTest(triggers, reports, options, distances);

    const domain = (vs: Iterable<VersionInfo>) => distances.inDomain(reports, [...vs].flatMap((v) => v.zoneIds), options.distanceKm);
    const match = (ts: TriggerEntity[], rs: StormReportEntity[]) =>
      matchReportsToTriggers(ts.map(toMatchable), rs.map((r) => ({ id: r.id, time: Date.parse(r.time) })), options.windowHours, (ti, ri) => near(ts[ti]!, rs[ri]!));

    const byRule: ScoreRowDto[] = [];
    const byVersion: ScoreRowDto[] = [];
    const perRule = new Map<number, RuleMatch>();
    for (const rule of rules) {
      const ruleVersions = [...versions.values()].filter((v) => v.entity.ruleId === rule.id);
      const own = triggers.filter((t) => t.ruleId === rule.id);
      const ruleReports = domain(ruleVersions);
      const matched = match(own, ruleReports);
      const owners = reportOwners(ruleReports, matched, own, ruleVersions);
      perRule.set(rule.id, { triggers: own, reports: ruleReports, matched, owners });
      if (own.length > 0 || rule.id === ruleId) byRule.push({ ruleId: rule.id, ruleName: rule.name, versionId: null, version: null, ...scoreMatch(matched) });
      for (const v of ruleVersions) {
        const scored = scoreVersion(v.entity.id, perRule.get(rule.id)!);
        const overlaps = v.from <= Date.parse(q.to) && (v.until === null || v.until >= Date.parse(q.from));
        const wanted = selectedVersion ? v.entity.id === selectedVersion.id : scored.triggers > 0 || scored.reports > 0 || (ruleId !== null && overlaps);
        if (wanted) byVersion.push({ ruleId: rule.id, ruleName: rule.name, versionId: v.entity.id, version: v.entity.version, ...scored });
      }
    }

    // The selection as a whole: one version, one rule, or every rule together (a report detected by any rule).
    const selection = ruleId ? perRule.get(ruleId)! : { triggers, reports: domain(versions.values()), matched: match(triggers, domain(versions.values())), owners: new Map<number, number>() };
    const overall = selectedVersion ? byVersion.find((r) => r.versionId === selectedVersion.id)! : ruleId ? byRule.find((r) => r.ruleId === ruleId)! : scoreMatch(selection.matched);
    const shownTriggers = selection.triggers.map((t, k) => ({ t, m: selection.matched.triggers[k]! })).filter(({ t }) => !selectedVersion || t.ruleVersionId === selectedVersion.id);
    const shownReports = selection.reports.map((r, k) => ({ r, m: selection.matched.reports[k]! })).filter(({ r }) => !selectedVersion || selection.owners.get(r.id) === selectedVersion.id);
    return {
      from: new Date(q.from).toISOString(),
      to: new Date(q.to).toISOString(),
      options,
      overall: { triggers: overall.triggers, reports: overall.reports, counts: overall.counts, scores: overall.scores, leadTime: overall.leadTime },
      byRule,
      byVersion,
      triggers: this.triggerRows(shownTriggers, ruleName, versions, zones, near.zoneFallbacks),
      reports: shownReports.map(({ r, m }) => ({ ...toStormReportDto(r), outcome: m.outcome, triggerIds: m.triggerIds, lateTriggerIds: m.lateTriggerIds, leadMinutes: m.leadMinutes })),
      zones: zones
        .filter((z) => triggers.some((t) => t.zoneId === z.id) || [...versions.values()].some((v) => (!ruleId || v.entity.ruleId === ruleId) && v.zoneIds.includes(z.id)))
        .map((z) => ({ id: z.id, code: z.code, name: z.name, geometry: JSON.parse(z.geometry) as unknown })),
    };
  }

  /** Two versions of a rule simulated over the same stored frames and scored against the same reports. */
  async compare(q: CompareQuery): Promise<VersionComparisonDto> {
    return compareVersions(this.dataSource, this.deps, q, resolveOptions(q));
  }

  private async triggersOverlapping(from: string, to: string, ruleId: number | null): Promise<TriggerEntity[]> {
    const qb = this.dataSource
      .getRepository(TriggerEntity)
      .createQueryBuilder("t")
      .where("t.first_valid_time <= :to AND t.last_valid_time >= :from", { from: new Date(from).toISOString(), to: new Date(to).toISOString() });
    if (ruleId) qb.andWhere("t.rule_id = :ruleId", { ruleId });
    return qb.orderBy("t.opened_at", "ASC").addOrderBy("t.id", "ASC").getMany();
  }

  /** Every version of the rules with its zones and the span during which it was current. */
  private async versionInfo(ruleIds: number[]): Promise<Map<number, VersionInfo>> {
    const rows = ruleIds.length ? await this.dataSource.getRepository(RuleVersionEntity).find({ where: { ruleId: In(ruleIds) }, order: { ruleId: "ASC", version: "ASC" } }) : [];
    const out = new Map<number, VersionInfo>();
    rows.forEach((v, k) => {
      const next = rows[k + 1]?.ruleId === v.ruleId ? rows[k + 1]! : null;
      out.set(v.id, { entity: v, zoneIds: (JSON.parse(v.definition) as RuleDefinition).zoneIds, from: Date.parse(v.createdAt), until: next ? Date.parse(next.createdAt) : null });
    });
    return out;
  }

  /**
   * The space test for every (trigger, report) pair that could match in time. Zone mode is a
   * distance to the zone; area mode rebuilds the matched area first (asynchronously, so it is
   * settled here and looked up synchronously during matching).
   */
  private async spaceTest(triggers: TriggerEntity[], reports: StormReportEntity[], options: MatchingOptionsDto, distances: ReportZoneDistances) {
    const byZone = (t: TriggerEntity, r: StormReportEntity) => distances.outside(r, t.zoneId) <= options.distanceKm;
    const areaNear = new Set<string>();
    const zoneFallbacks = new Set<number>();
    if (options.space === "area") {
      await this.areas.loadFrames(triggers.map((t) => t.id));
      const windowMs = options.windowHours * HOUR_MS;
      for (const t of triggers) {
        for (const r of reports) {
          const time = Date.parse(r.time);
          if (time < Date.parse(t.firstValidTime) - windowMs || time > Date.parse(t.lastValidTime) + windowMs) continue;
          const points = await this.areas.near(t.id, time, options.windowHours);
          if (points === null) zoneFallbacks.add(t.id);
          const isNear = points === null ? byZone(t, r) : anySetWithinKm(points, r.latitude, r.longitude, options.distanceKm);
          if (isNear) areaNear.add(`${t.id}:${r.id}`);
        }
      }
    }
    const near = (t: TriggerEntity, r: StormReportEntity) => (options.space === "area" ? areaNear.has(`${t.id}:${r.id}`) : byZone(t, r));
    return Object.assign(near, { zoneFallbacks });
  }

  private triggerRows(
    shown: Array<{ t: TriggerEntity; m: { verified: boolean; reportIds: number[] } }>,
    ruleName: Map<number, string>,
    versions: Map<number, VersionInfo>,
    zones: ZoneEntity[],
    zoneFallbacks: Set<number>,
  ): VerificationDto["triggers"] {
    return shown.map(({ t, m }) => ({
      id: t.id,
      ruleId: t.ruleId,
      ruleName: ruleName.get(t.ruleId) ?? `rule ${t.ruleId}`,
      versionId: t.ruleVersionId,
      version: versions.get(t.ruleVersionId)?.entity.version ?? 0,
      zoneId: t.zoneId,
      zoneCode: zones.find((z) => z.id === t.zoneId)?.code ?? "?",
      openedAt: t.openedAt,
      firstValidTime: t.firstValidTime,
      lastValidTime: t.lastValidTime,
      verified: m.verified,
      reportIds: m.reportIds,
      usedZoneInstead: zoneFallbacks.has(t.id),
    }));
  }
}

interface RuleMatch {
  triggers: TriggerEntity[];
  reports: StormReportEntity[];
  matched: MatchResult;
  /** Report id → the version it counts for. */
  owners: Map<number, number>;
}

/**
 * Each report counts for one version of its rule: the version of the earliest-opened trigger that
 * detected it, or, undetected, the version that was current when it happened (none before the
 * rule's first version).
 */
function reportOwners(reports: StormReportEntity[], matched: MatchResult, triggers: TriggerEntity[], ruleVersions: VersionInfo[]): Map<number, number> {
  const byId = new Map(triggers.map((t) => [t.id, t]));
  const owners = new Map<number, number>();
  reports.forEach((r, k) => {
    const m = matched.reports[k]!;
    if (m.outcome === "detected") {
      const first = m.triggerIds.map((id) => byId.get(id)!).reduce((a, b) => (Date.parse(b.openedAt) < Date.parse(a.openedAt) ? b : a));
      owners.set(r.id, first.ruleVersionId);
      return;
    }
    const time = Date.parse(r.time);
    const current = ruleVersions.find((v) => time >= v.from && (v.until === null || time < v.until));
    if (current) owners.set(r.id, current.entity.id);
  });
  return owners;
}

/** One version's row: its own triggers (verified or not, by the rule's match) and the reports it owns. */
function scoreVersion(versionId: number, rule: RuleMatch): ScoredMatch {
  let verifiedTriggers = 0;
  let falseAlarms = 0;
  rule.triggers.forEach((t, k) => {
    if (t.ruleVersionId !== versionId) return;
    if (rule.matched.triggers[k]!.verified) verifiedTriggers++;
    else falseAlarms++;
  });
  let detectedReports = 0;
  let misses = 0;
  const leads: number[] = [];
  rule.reports.forEach((r, k) => {
    if (rule.owners.get(r.id) !== versionId) return;
    const m = rule.matched.reports[k]!;
    if (m.outcome === "detected") {
      detectedReports++;
      leads.push(m.leadMinutes!);
    } else misses++;
  });
  return scoreCounts({ verifiedTriggers, falseAlarms, detectedReports, misses }, leads);
}
