import type { ZoneGeometry } from "../../shared/zones/zone-geometry.ts";
import { distanceOutsideZoneKm } from "../../shared/verification/zone-proximity.ts";
import type { StormReportEntity } from "../entities/storm-report.entity.ts";

/**
 * Reports are placed to the 0.5 km: coordinates come from spotters and damage surveys, rarely
 * better than that, so a report this close to a zone's edge is taken as on the edge (inside).
 */
export const EDGE_TOLERANCE_KM = 0.5;

/** How far each report lies outside each zone, computed once per pair. */
export class ReportZoneDistances {
  private readonly cache = new Map<string, number>();

  constructor(private readonly zones: ReadonlyMap<number, ZoneGeometry>) {}

  /** 0 inside the zone or on its edge; otherwise km to the nearest edge (Infinity for an unknown zone). */
  outside(report: Pick<StormReportEntity, "id" | "latitude" | "longitude">, zoneId: number): number {
    const key = `${report.id}:${zoneId}`;
    let distance = this.cache.get(key);
    if (distance === undefined) {
      const geometry = this.zones.get(zoneId);
      distance = geometry ? distanceOutsideZoneKm(geometry, report.latitude, report.longitude, EDGE_TOLERANCE_KM) : Infinity;
      this.cache.set(key, distance);
    }
    return distance;
  }

  /** Reports inside (or within `distanceKm` of) any of the zones: the area a rule answers for. */
  inDomain<R extends Pick<StormReportEntity, "id" | "latitude" | "longitude">>(reports: readonly R[], zoneIds: Iterable<number>, distanceKm: number): R[] {
    const ids = [...new Set(zoneIds)];
    return reports.filter((r) => ids.some((z) => this.outside(r, z) <= distanceKm));
  }
}
