/**
 * A local cross-check of the axis-based labels, needing no axis at all: where the smoothed speed is at
 * least `axisSpeed`, exit ⇔ ∂S/∂s < 0 (air slowing down) and left ⇔ ∂S/∂n < 0 (speed falling to the left).
 * If it disagrees with the axis labels on too many cells, the axis tracing probably went wrong (a noisy
 * field, a jet along the grid edge) and the frame carries a data-quality warning.
 */
import { QUADRANT, type QuadrantCode } from "./labels.ts";

/** Quadrant from local derivatives alone (never "core"); none where the speed is below `axisSpeed` or undefined. */
export function localQuadrant(speed: number, alongSpeedChange: number, crossSpeedGradient: number, axisSpeed: number): QuadrantCode {
  if (!(speed >= axisSpeed) || !(alongSpeedChange === alongSpeedChange) || !(crossSpeedGradient === crossSpeedGradient)) {
    return QUADRANT.none;
  }
  const left = crossSpeedGradient < 0;
  if (alongSpeedChange < 0) return left ? QUADRANT.leftExit : QUADRANT.rightExit;
  return left ? QUADRANT.leftEntrance : QUADRANT.rightEntrance;
}

export interface FallbackComparison {
  /** Cells labelled entrance/exit by the axis method where the local check also has a label. */
  readonly compared: number;
  readonly disagreeing: number;
  /** disagreeing / compared (0 when nothing was compared). */
  readonly disagreementFraction: number;
}

export function compareWithLocalQuadrants(
  quadrant: Float32Array,
  speed: Float32Array,
  alongSpeedChange: Float32Array,
  crossSpeedGradient: Float32Array,
  axisSpeed: number,
): FallbackComparison {
  let compared = 0;
  let disagreeing = 0;
  for (let p = 0; p < quadrant.length; p++) {
    const q = quadrant[p];
    if (q === QUADRANT.none || q === QUADRANT.core) continue;
    const local = localQuadrant(speed[p], alongSpeedChange[p], crossSpeedGradient[p], axisSpeed);
    if (local === QUADRANT.none) continue;
    compared++;
    if (local !== q) disagreeing++;
  }
  return { compared, disagreeing, disagreementFraction: compared > 0 ? disagreeing / compared : 0 };
}
