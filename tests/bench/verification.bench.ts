/**
 * Verification speed for a season: 3,000 triggers over the eight demo zones in 90 days and 5,000
 * storm reports, matched in zone mode (zone distances cached per report and zone, as the service
 * does) and then scored. Synthetic, seeded data invented for the benchmark, never a check value.
 */
import { demoZones } from "../../server/demo/demo-zones.ts";
import { matchReportsToTriggers, type TriggerToMatch } from "../../shared/verification/match-reports.ts";
import { verificationScores } from "../../shared/verification/contingency-scores.ts";
import { medianAndP90 } from "../../shared/verification/sample-quantile.ts";
import { distanceOutsideZoneKm } from "../../shared/verification/zone-proximity.ts";
import type { ZoneGeometry } from "../../shared/zones/zone-geometry.ts";
import { seededRandom, uniform } from "../reference/helpers/seeded-random.ts";

const TRIGGERS = 3000;
const REPORTS = 5000;
const DAYS = 90;
const H = 3_600_000;

export async function run(): Promise<void> {
  const random = seededRandom(20261202);
  const zones = demoZones().map((z) => z.geometry as ZoneGeometry);
  const start = Date.parse("2026-04-01T00:00:00Z");
  const triggers: Array<TriggerToMatch & { zone: number }> = Array.from({ length: TRIGGERS }, (_, id) => {
    const first = start + Math.floor(uniform(random, 0, DAYS * 24)) * H;
    return { id, zone: Math.floor(random() * zones.length), openedAt: first - Math.floor(uniform(random, 1, 12)) * H, firstValidTime: first, lastValidTime: first + Math.floor(uniform(random, 0, 6)) * H };
  });
  const reports = Array.from({ length: REPORTS }, (_, id) => ({ id, time: start + uniform(random, 0, DAYS * 24) * H, lat: uniform(random, 33.8, 38.2), lon: uniform(random, -101.2, -94.8) }));

  let t = performance.now();
  const cache = new Map<number, number>();
  const outside = (zone: number, r: number) => {
    const key = r * zones.length + zone;
    let d = cache.get(key);
    if (d === undefined) {
      d = distanceOutsideZoneKm(zones[zone]!, reports[r]!.lat, reports[r]!.lon, 0.5);
      cache.set(key, d);
    }
    return d;
  };
  const result = matchReportsToTriggers(triggers, reports, 1, (ti, ri) => outside(triggers[ti]!.zone, ri) <= 0);
  const matchSeconds = (performance.now() - t) / 1000;
  t = performance.now();
  const scores = verificationScores(result.counts);
  const lead = medianAndP90(result.leadTimesMinutes);
  const scoreSeconds = (performance.now() - t) / 1000;
  console.log(`${TRIGGERS} triggers × ${REPORTS} reports over ${DAYS} days: matched in ${matchSeconds.toFixed(3)} s (${cache.size} zone distances computed), scored in ${scoreSeconds.toFixed(4)} s`);
  console.log(`counts ${JSON.stringify(result.counts)}; POD ${scores.pod?.toFixed(2)}, FAR ${scores.far?.toFixed(2)}, CSI ${scores.csi?.toFixed(2)}; median lead ${lead.median?.toFixed(0)} min`);
}
