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
import { anyPointWithinKm } from "../../shared/verification/matched-points.ts";
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
import { scoreMatch } from "./score-row.ts";
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

    const triggers = await this.triggersOverlapping(q.from, q.to, ruleId, selectedVersion?.id ?? null);
    const rules = await this.dataSource.getRepository(RuleEntity).find(ruleId ? { where: { id: ruleId } } : {});
    const ruleName = new Map(rules.map((r) => [r.id, r.name]));
    const versions = await this.versionInfo(rules.map((r) => r.id));
    const zoneIds = new Set([...triggers.map((t) => t.zoneId), ...[...versions.values()].flatMap((v) => v.zoneIds)]);
    const zones = await this.dataSource.getRepository(ZoneEntity).find({ where: { id: In([...zoneIds]) } });
    const distances = new ReportZoneDistances(new Map(zones.map((z) => [z.id, JSON.parse(z.geometry) as ZoneGeometry])));
    const reports = await this.deps.reports.find({ from: q.from, to: q.to, kinds: options.kinds });
    const near = await this.spaceTest(triggers, reports, options, distances);

    const domain = (vs: Iterable<VersionInfo>) => distances.inDomain(reports, [...vs].flatMap((v) => v.zoneIds), options.distanceKm);
    const during = (v: VersionInfo, list: StormReportEntity[]) => list.filter((r) => Date.parse(r.time) >= v.from && (v.until === null || Date.parse(r.time) < v.until));
    const match = (ts: TriggerEntity[], rs: StormReportEntity[]) =>
      matchReportsToTriggers(ts.map(toMatchable), rs.map((r) => ({ id: r.id, time: Date.parse(r.time) })), options.windowHours, (ti, ri) => near(ts[ti]!, rs[ri]!));

    const byVersion: ScoreRowDto[] = [];
    for (const v of versions.values()) {
      const own = triggers.filter((t) => t.ruleVersionId === v.entity.id);
      const overlaps = v.from <= Date.parse(q.to) && (v.until === null || v.until >= Date.parse(q.from));
      if (selectedVersion ? v.entity.id !== selectedVersion.id : own.length === 0 && !(ruleId && overlaps)) continue;
      const scored = scoreMatch(match(own, during(v, domain([v]))));
      byVersion.push({ ruleId: v.entity.ruleId, ruleName: ruleName.get(v.entity.ruleId) ?? `rule ${v.entity.ruleId}`, versionId: v.entity.id, version: v.entity.version, ...scored });
    }
    const byRule: ScoreRowDto[] = [];
    for (const rule of rules) {
      const own = triggers.filter((t) => t.ruleId === rule.id);
      if (own.length === 0 && rule.id !== ruleId) continue;
      const scored = scoreMatch(match(own, domain([...versions.values()].filter((v) => v.entity.ruleId === rule.id))));
      byRule.push({ ruleId: rule.id, ruleName: rule.name, versionId: null, version: null, ...scored });
    }

    const selected = selectedVersion ? versions.get(selectedVersion.id)! : null;
    const overallReports = selected ? during(selected, domain([selected])) : domain([...versions.values()].filter((v) => !ruleId || v.entity.ruleId === ruleId));
    const overall = match(triggers, overallReports);
    return {
      from: new Date(q.from).toISOString(),
      to: new Date(q.to).toISOString(),
      options,
      overall: scoreMatch(overall),
      byRule,
      byVersion,
      triggers: this.triggerRows(triggers, overall, ruleName, versions, zones, near.zoneFallbacks),
      reports: overallReports.map((r, k) => {
        const m = overall.reports[k]!;
        return { ...toStormReportDto(r), outcome: m.outcome, triggerIds: m.triggerIds, lateTriggerIds: m.lateTriggerIds, leadMinutes: m.leadMinutes };
      }),
      zones: zones
        .filter((z) => triggers.some((t) => t.zoneId === z.id) || [...versions.values()].some((v) => (!ruleId || v.entity.ruleId === ruleId) && v.zoneIds.includes(z.id)))
        .map((z) => ({ id: z.id, code: z.code, name: z.name, geometry: JSON.parse(z.geometry) as unknown })),
    };
  }

  /** Two versions of a rule simulated over the same stored frames and scored against the same reports. */
  async compare(q: CompareQuery): Promise<VersionComparisonDto> {
    return compareVersions(this.dataSource, this.deps, q, resolveOptions(q));
  }

  private async triggersOverlapping(from: string, to: string, ruleId: number | null, versionId: number | null): Promise<TriggerEntity[]> {
    const qb = this.dataSource
      .getRepository(TriggerEntity)
      .createQueryBuilder("t")
      .where("t.first_valid_time <= :to AND t.last_valid_time >= :from", { from: new Date(from).toISOString(), to: new Date(to).toISOString() });
    if (ruleId) qb.andWhere("t.rule_id = :ruleId", { ruleId });
    if (versionId) qb.andWhere("t.rule_version_id = :versionId", { versionId });
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
          const isNear = points === null ? byZone(t, r) : anyPointWithinKm(points, r.latitude, r.longitude, options.distanceKm);
          if (isNear) areaNear.add(`${t.id}:${r.id}`);
        }
      }
    }
    const near = (t: TriggerEntity, r: StormReportEntity) => (options.space === "area" ? areaNear.has(`${t.id}:${r.id}`) : byZone(t, r));
    return Object.assign(near, { zoneFallbacks });
  }

  private triggerRows(
    triggers: TriggerEntity[],
    overall: MatchResult,
    ruleName: Map<number, string>,
    versions: Map<number, VersionInfo>,
    zones: ZoneEntity[],
    zoneFallbacks: Set<number>,
  ): VerificationDto["triggers"] {
    return triggers.map((t, k) => ({
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
      verified: overall.triggers[k]!.verified,
      reportIds: overall.triggers[k]!.reportIds,
      usedZoneInstead: zoneFallbacks.has(t.id),
    }));
  }
}
