import type { DataSource } from "typeorm";
import type { GridGeometry } from "../../shared/grid/geometry-types.ts";
import { gridCoordinates } from "../../shared/grid/grid-coordinates.ts";
import { decodeMaskBits } from "../../shared/grid/mask-bits.ts";
import { pointsOfMask, type MatchedPoints } from "../../shared/verification/matched-points.ts";
import { RuleEvaluationEntity } from "../entities/rule-evaluation.entity.ts";
import type { RuleMapService } from "../rules/rule-map.service.ts";
import { NotFoundError } from "../errors.ts";

const HOUR_MS = 3_600_000;
const CACHE_LIMIT = 4000;

/** A frame whose stored fields are gone (pruned by retention) or no longer listed. */
const isGone = (error: unknown) => error instanceof NotFoundError || (error as NodeJS.ErrnoException | null)?.code === "ENOENT";

export interface TriggerFrame {
  frameId: number;
  validTime: number;
}

/**
 * Where a stored trigger's rule matched, frame by frame, rebuilt from the stored fields through
 * RuleMapService.triggerMask. Frames and rule versions never change, so each (trigger, frame) area
 * is computed once and kept in a bounded cache. When a frame's fields are gone (retention pruned
 * them) the area cannot be rebuilt and the caller falls back to the zone.
 */
export class TriggerAreas {
  private readonly cache = new Map<string, MatchedPoints | null>();
  private readonly frames = new Map<number, TriggerFrame[]>();

  constructor(
    private readonly dataSource: DataSource,
    private readonly maps: RuleMapService,
  ) {}

  /** Loads the frames in which each trigger's rule was met, once for many triggers. */
  async loadFrames(triggerIds: readonly number[]): Promise<void> {
    const missing = triggerIds.filter((id) => !this.frames.has(id));
    for (const id of missing) this.frames.set(id, []);
    for (let k = 0; k < missing.length; k += 500) {
      const rows = await this.dataSource.getRepository(RuleEvaluationEntity).find({
        where: missing.slice(k, k + 500).map((triggerId) => ({ triggerId, met: true })),
        select: { triggerId: true, frameId: true, validTime: true },
      });
      for (const row of rows) this.frames.get(row.triggerId!)!.push({ frameId: row.frameId, validTime: Date.parse(row.validTime) });
    }
  }

  /**
   * The matched points of the trigger's frames valid within `windowHours` of the report time (the
   * nearest frame when none is), one set per frame; null when any needed frame can no longer be rebuilt.
   */
  async near(triggerId: number, reportTime: number, windowHours: number): Promise<MatchedPoints[] | null> {
    const frames = this.frames.get(triggerId) ?? [];
    if (frames.length === 0) return null;
    const reach = Math.max(windowHours, 0.5) * HOUR_MS;
    let chosen = frames.filter((f) => Math.abs(f.validTime - reportTime) <= reach);
    if (chosen.length === 0) {
      const nearest = frames.reduce((a, b) => (Math.abs(b.validTime - reportTime) < Math.abs(a.validTime - reportTime) ? b : a));
      chosen = [nearest];
    }
    const sets: MatchedPoints[] = [];
    for (const frame of chosen) {
      const points = await this.frameArea(triggerId, frame.frameId);
      if (points === null) return null;
      sets.push(points);
    }
    return sets;
  }

  private async frameArea(triggerId: number, frameId: number): Promise<MatchedPoints | null> {
    const key = `${triggerId}:${frameId}`;
    const cached = this.cache.get(key);
    if (cached !== undefined) return cached;
    let points: MatchedPoints | null = null;
    try {
      const area = await this.maps.triggerMask(triggerId, frameId);
      if (area.mask) {
        const geometry = area.geometry as GridGeometry;
        const { lat, lon } = gridCoordinates(geometry);
        points = pointsOfMask(decodeMaskBits(area.mask, geometry.nx * geometry.ny), lat, lon);
      }
    } catch (error) {
      if (!isGone(error)) throw error;
    }
    // Insertion order is age: drop the oldest entry once the cache is full.
    if (this.cache.size >= CACHE_LIMIT) this.cache.delete(this.cache.keys().next().value!);
    this.cache.set(key, points);
    return points;
  }
}
