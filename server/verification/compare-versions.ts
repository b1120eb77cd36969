import type { DataSource } from "typeorm";
import { In } from "typeorm";
import type { CompareQuery, MatchingOptionsDto, VersionComparisonDto } from "../../shared/api/verification.ts";
import type { RuleDefinition } from "../../shared/api/rules.ts";
import type { GridGeometry } from "../../shared/grid/geometry-types.ts";
import { gridCoordinates } from "../../shared/grid/grid-coordinates.ts";
import { decodeMaskBits } from "../../shared/grid/mask-bits.ts";
import type { ZoneGeometry } from "../../shared/zones/zone-geometry.ts";
import { matchReportsToTriggers } from "../../shared/verification/match-reports.ts";
import { anySetWithinKm, pointsOfMask, type MatchedPoints } from "../../shared/verification/matched-points.ts";
import { GridFrameEntity } from "../entities/grid-frame.entity.ts";
import { ZoneEntity } from "../entities/zone.entity.ts";
import { NotFoundError } from "../errors.ts";
import type { RuleService } from "../services/rule.service.ts";
import type { ZoneService } from "../services/zone.service.ts";
import type { RuleMapService } from "../rules/rule-map.service.ts";
import type { StormReportService } from "../storm-reports/storm-report.service.ts";
import { toStormReportDto } from "../storm-reports/storm-report.service.ts";
import { ReportZoneDistances } from "./report-space.ts";
import { scoreMatch } from "./score-row.ts";
import { simulatedTriggers, type SimulatedTrigger } from "./simulated-triggers.ts";

const HOUR_MS = 3_600_000;
/** A run stored more than this long after its initial time was loaded after the fact (an archive). */
const LIVE_ARRIVAL_LIMIT_MS = 24 * HOUR_MS;

/**
 * When a simulated trigger would have opened: when its opening frame was stored, if that frame
 * arrived live; for a run loaded long after the fact, the run's initial time instead (lead times
 * are then optimistic by the model's delivery delay, which the screen says).
 */
export function simulatedOpening(frame: Pick<GridFrameEntity, "createdAt" | "runTime"> | undefined, fallback: string): string {
  if (!frame) return fallback;
  return Date.parse(frame.createdAt) - Date.parse(frame.runTime) <= LIVE_ARRIVAL_LIMIT_MS ? frame.createdAt : frame.runTime;
}

type Backtest = Awaited<ReturnType<RuleMapService["backtest"]>>;

interface Deps {
  rules: RuleService;
  zones: ZoneService;
  maps: RuleMapService;
  reports: StormReportService;
}

/**
 * Runs the backtest of each version over the same newest stored runs (notifying no one), rebuilds
 * the triggers each would have opened, and scores both against the same storm reports: those of
 * the chosen kinds inside either version's zones during the simulated valid times (± the window).
 * A simulated trigger opens when the frame that opened it was stored, as the live engine would
 * (see simulatedOpening for runs loaded after the fact).
 */
export async function compareVersions(dataSource: DataSource, deps: Deps, q: CompareQuery, options: MatchingOptionsDto): Promise<VersionComparisonDto> {
  const rule = await deps.rules.find(q.ruleId, true);
  const versions = [await deps.rules.version(q.versionA), await deps.rules.version(q.versionB)];
  for (const v of versions) if (v.ruleId !== rule.id) throw new NotFoundError(`Version ${v.id} of rule ${rule.id}`);
  // One after the other: each backtest reads and evaluates every frame, and the machine is shared.
  const backtests: Backtest[] = [];
  for (const v of versions) backtests.push(await deps.maps.backtest(rule.id, { versionId: v.id, runs: q.runs }));

  const frameIds = [...new Set(backtests.flatMap((b) => b.frames.map((f) => f.frame.id)))];
  const frames = frameIds.length ? await dataSource.getRepository(GridFrameEntity).find({ where: { id: In(frameIds) } }) : [];
  const frameById = new Map(frames.map((f) => [f.id, f]));
  const validTimes = frames.map((f) => Date.parse(f.validTime));
  const windowMs = options.windowHours * HOUR_MS;
  const from = validTimes.length ? new Date(Math.min(...validTimes) - windowMs).toISOString() : null;
  const to = validTimes.length ? new Date(Math.max(...validTimes) + windowMs).toISOString() : null;

  const definitions = versions.map((v) => JSON.parse(v.definition) as RuleDefinition);
  const zoneIds = [...new Set(definitions.flatMap((d) => d.zoneIds))];
  const zones = zoneIds.length ? await dataSource.getRepository(ZoneEntity).find({ where: { id: In(zoneIds) } }) : [];
  const distances = new ReportZoneDistances(new Map(zones.map((z) => [z.id, JSON.parse(z.geometry) as ZoneGeometry])));
  const reports = from && to ? distances.inDomain(await deps.reports.find({ from, to, kinds: options.kinds }), zoneIds, options.distanceKm) : [];
  const reportTimes = reports.map((r) => ({ id: r.id, time: Date.parse(r.time) }));
  const detectedBy = new Map<number, number[]>(reports.map((r) => [r.id, []]));

  const results = [];
  for (const [k, version] of versions.entries()) {
    const backtest = backtests[k]!;
    const simulated = simulatedTriggers(backtest);
    const near = await simulatedSpaceTest(deps.zones, backtest, simulated, reports, options, distances);
    const matched = matchReportsToTriggers(
      simulated.map((s, i) => ({
        id: i,
        openedAt: Date.parse(simulatedOpening(frameById.get(s.openingFrameId), s.firstValidTime)),
        firstValidTime: Date.parse(s.firstValidTime),
        lastValidTime: Date.parse(s.lastValidTime),
      })),
      reportTimes,
      options.windowHours,
      near,
    );
    for (const r of matched.reports) if (r.outcome === "detected") detectedBy.get(r.id)!.push(version.id);
    const { counts, scores, leadTime } = scoreMatch(matched);
    results.push({
      versionId: version.id,
      version: version.version,
      expression: definitions[k]!.expression,
      triggers: simulated.map((s, i) => ({
        zoneId: s.zoneId,
        zoneCode: zones.find((z) => z.id === s.zoneId)?.code ?? "?",
        openedAt: simulatedOpening(frameById.get(s.openingFrameId), s.firstValidTime),
        firstValidTime: s.firstValidTime,
        lastValidTime: s.lastValidTime,
        verified: matched.triggers[i]!.verified,
        reportIds: matched.triggers[i]!.reportIds,
      })),
      counts,
      scores,
      leadTime,
    });
  }

  const runs = new Map<string, { model: string; runTime: string }>();
  for (const f of frames) runs.set(`${f.model}|${f.runTime}`, { model: f.model, runTime: f.runTime });
  return {
    ruleId: rule.id,
    ruleName: rule.name,
    options,
    runs: [...runs.values()].sort((a, b) => b.runTime.localeCompare(a.runTime)),
    frames: frames.length,
    from,
    to,
    versions: results,
    reports: reports.map((r) => ({ ...toStormReportDto(r), detectedBy: detectedBy.get(r.id) ?? [] })),
  };
}

/**
 * Zone mode: the report's distance to the simulated trigger's zone. Area mode: the points where the
 * version matched inside that zone in the trigger's frames near the report time (the backtest's
 * per-frame map, cut to the zone's mask).
 */
async function simulatedSpaceTest(
  zones: ZoneService,
  backtest: Backtest,
  simulated: SimulatedTrigger[],
  reports: Array<{ id: number; latitude: number; longitude: number; time: string }>,
  options: MatchingOptionsDto,
  distances: ReportZoneDistances,
): Promise<(triggerIndex: number, reportIndex: number) => boolean> {
  const byZone = (t: number, r: number) => distances.outside(reports[r]!, simulated[t]!.zoneId) <= options.distanceKm;
  if (options.space === "zone" || !backtest.geometry) return byZone;
  const geometry = backtest.geometry as GridGeometry;
  const n = geometry.nx * geometry.ny;
  const { lat, lon } = gridCoordinates(geometry);
  const frameMasks = new Map(backtest.frames.map((f) => [f.frame.id, { validTime: Date.parse(f.frame.validTime), mask: f.mask }]));
  const areaCache = new Map<string, MatchedPoints>();
  const areaOf = async (frameId: number, zoneId: number): Promise<MatchedPoints> => {
    const key = `${frameId}:${zoneId}`;
    let points = areaCache.get(key);
    if (!points) {
      const encoded = frameMasks.get(frameId)?.mask;
      const met = encoded ? decodeMaskBits(encoded, n) : new Uint8Array(n);
      const zoneMask = await zones.maskFor(zoneId, geometry);
      for (let i = 0; i < n; i++) met[i] = met[i]! & zoneMask[i]!;
      points = pointsOfMask(met, lat, lon);
      areaCache.set(key, points);
    }
    return points;
  };
  const pairs = new Set<string>();
  const reach = Math.max(options.windowHours, 0.5) * HOUR_MS;
  const windowMs = options.windowHours * HOUR_MS;
  for (const [t, trigger] of simulated.entries()) {
    const frames = trigger.frameIds.map((id) => ({ id, validTime: frameMasks.get(id)!.validTime }));
    const first = Date.parse(trigger.firstValidTime) - windowMs;
    const last = Date.parse(trigger.lastValidTime) + windowMs;
    for (const [r, report] of reports.entries()) {
      const time = Date.parse(report.time);
      // Pairs the time test will refuse anyway need no area.
      if (time < first || time > last) continue;
      let chosen = frames.filter((f) => Math.abs(f.validTime - time) <= reach);
      if (chosen.length === 0) chosen = [frames.reduce((a, b) => (Math.abs(b.validTime - time) < Math.abs(a.validTime - time) ? b : a))];
      const sets = await Promise.all(chosen.map((f) => areaOf(f.id, trigger.zoneId)));
      if (anySetWithinKm(sets, report.latitude, report.longitude, options.distanceKm)) pairs.add(`${t}:${r}`);
    }
  }
  return (t, r) => pairs.has(`${t}:${r}`);
}
