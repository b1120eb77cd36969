/**
 * Quadrant labels and the favoured-divergence flags of jet streaks.
 *
 * The four-quadrant picture of a straight streak (Uccellini and Kocin 1987; Bluestein 1993, Vol. II):
 * facing downstream in the Northern Hemisphere, upper divergence lies in the right entrance and the left
 * exit; in the Southern Hemisphere, where f < 0, in the left entrance and the right exit. Along a curved
 * streak the gradient-wind imbalance adds an along-stream ageostrophic wind (Beebe and Bates 1955; Keyser
 * and Shapiro 1986), so a cyclonic streak favours the exit side and the downstream half of the core, and an
 * anticyclonic one the entrance side and the upstream half; the divergent quadrant of the straight model on
 * the other side is then only "ambiguous". Quadrant labels themselves are pure geometry and never change.
 */
import type { CurvatureClass } from "./jet-types.ts";

export const QUADRANT = {
  none: 0,
  leftEntrance: 1,
  rightEntrance: 2,
  leftExit: 3,
  rightExit: 4,
  core: 5,
} as const;
export type QuadrantCode = (typeof QUADRANT)[keyof typeof QUADRANT];

/** Quadrant from σ (along the axis, downstream +) and ν (across, left +); |σ| ≤ coreHalfLength is the core band. */
export function quadrantOf(along: number, across: number, coreHalfLength: number): QuadrantCode {
  if (!(along === along) || !(across === across)) return QUADRANT.none;
  if (Math.abs(along) <= coreHalfLength) return QUADRANT.core;
  // A point exactly on the axis (ν = 0) counts as left; it has measure zero on a grid.
  const left = across >= 0;
  if (along > 0) return left ? QUADRANT.leftExit : QUADRANT.rightExit;
  return left ? QUADRANT.leftEntrance : QUADRANT.rightEntrance;
}

export const DIVERGENCE_VERDICT = { neither: 0, favoured: 1, ambiguous: 2 } as const;
export type DivergenceVerdict = (typeof DIVERGENCE_VERDICT)[keyof typeof DIVERGENCE_VERDICT];

/**
 * Whether upper divergence is favoured at a labelled point, given the streak's curvature class and
 * hemisphere (sign of f at its core). `along` (σ) splits the core band into upstream and downstream halves.
 */
export function divergenceVerdict(quadrant: QuadrantCode, along: number, curvatureClass: CurvatureClass, northern: boolean): DivergenceVerdict {
  if (quadrant === QUADRANT.none) return DIVERGENCE_VERDICT.neither;
  // The straight-model divergent quadrants, named by side: the cyclonic side is left in the NH, right in the SH.
  const anticyclonicSideEntrance = northern ? QUADRANT.rightEntrance : QUADRANT.leftEntrance;
  const cyclonicSideExit = northern ? QUADRANT.leftExit : QUADRANT.rightExit;
  if (curvatureClass === 0) {
    return quadrant === anticyclonicSideEntrance || quadrant === cyclonicSideExit ? DIVERGENCE_VERDICT.favoured : DIVERGENCE_VERDICT.neither;
  }
  if (curvatureClass === 1) {
    if (quadrant === QUADRANT.leftExit || quadrant === QUADRANT.rightExit) return DIVERGENCE_VERDICT.favoured;
    if (quadrant === QUADRANT.core && along > 0) return DIVERGENCE_VERDICT.favoured;
    return quadrant === anticyclonicSideEntrance ? DIVERGENCE_VERDICT.ambiguous : DIVERGENCE_VERDICT.neither;
  }
  if (quadrant === QUADRANT.leftEntrance || quadrant === QUADRANT.rightEntrance) return DIVERGENCE_VERDICT.favoured;
  if (quadrant === QUADRANT.core && along < 0) return DIVERGENCE_VERDICT.favoured;
  return quadrant === cyclonicSideExit ? DIVERGENCE_VERDICT.ambiguous : DIVERGENCE_VERDICT.neither;
}

/** What the labeller needs to know about each streak. */
export interface StreakSummary {
  readonly curvatureClass: CurvatureClass;
  readonly curvatureStrong: boolean;
  readonly northern: boolean;
  readonly coreSpeed: number;
}

/** The per-point label fields, one array per catalogue key. */
export interface LabelFields {
  readonly quadrant: Float32Array;
  readonly leftExit: Float32Array;
  readonly rightEntrance: Float32Array;
  readonly exit: Float32Array;
  readonly entrance: Float32Array;
  readonly curvatureClass: Float32Array;
  readonly curvatureStrong: Float32Array;
  readonly divergenceFavoured: Float32Array;
  readonly divergenceAmbiguous: Float32Array;
  readonly ascentSupport: Float32Array;
  readonly coreSpeed: Float32Array;
}

export function allocateLabelFields(pointCount: number): LabelFields {
  const make = () => new Float32Array(pointCount);
  return {
    quadrant: make(),
    leftExit: make(),
    rightEntrance: make(),
    exit: make(),
    entrance: make(),
    curvatureClass: make(),
    curvatureStrong: make(),
    divergenceFavoured: make(),
    divergenceAmbiguous: make(),
    ascentSupport: make(),
    coreSpeed: make(),
  };
}

/**
 * Writes labels and flags for every point. Booleans are 0/1 everywhere; the curvature class and core speed
 * are NaN away from streaks. Ascent support = favoured AND divergence > `ascentDivergence` (s⁻¹).
 */
export function labelPoints(
  owner: Int32Array,
  along: Float32Array,
  across: Float32Array,
  streaks: readonly StreakSummary[],
  divergence: Float32Array,
  settings: { coreHalfLength: number; ascentDivergence: number },
  out: LabelFields = allocateLabelFields(owner.length),
): LabelFields {
  // Most points belong to no streak: bulk-fill their values, then visit only the owned points.
  for (const zeroed of [out.quadrant, out.leftExit, out.rightEntrance, out.exit, out.entrance, out.curvatureStrong, out.divergenceFavoured, out.divergenceAmbiguous, out.ascentSupport]) {
    zeroed.fill(0);
  }
  out.curvatureClass.fill(Number.NaN);
  out.coreSpeed.fill(Number.NaN);
  for (let p = 0; p < owner.length; p++) {
    if (owner[p] < 0) continue;
    const streak = streaks[owner[p]];
    const quadrant = quadrantOf(along[p], across[p], settings.coreHalfLength);
    out.quadrant[p] = quadrant;
    out.leftExit[p] = quadrant === QUADRANT.leftExit ? 1 : 0;
    out.rightEntrance[p] = quadrant === QUADRANT.rightEntrance ? 1 : 0;
    out.exit[p] = quadrant === QUADRANT.leftExit || quadrant === QUADRANT.rightExit ? 1 : 0;
    out.entrance[p] = quadrant === QUADRANT.leftEntrance || quadrant === QUADRANT.rightEntrance ? 1 : 0;
    const verdict = divergenceVerdict(quadrant, along[p], streak.curvatureClass, streak.northern);
    const favoured = verdict === DIVERGENCE_VERDICT.favoured;
    out.curvatureClass[p] = streak.curvatureClass;
    out.curvatureStrong[p] = streak.curvatureStrong ? 1 : 0;
    out.coreSpeed[p] = streak.coreSpeed;
    out.divergenceFavoured[p] = favoured ? 1 : 0;
    out.divergenceAmbiguous[p] = verdict === DIVERGENCE_VERDICT.ambiguous ? 1 : 0;
    out.ascentSupport[p] = favoured && divergence[p] > settings.ascentDivergence ? 1 : 0;
  }
  return out;
}
