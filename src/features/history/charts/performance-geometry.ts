/**
 * The lines of a performance diagram (Roebber 2009, Wea. Forecasting 24, 601–608): success ratio
 * (1 − FAR) on x, probability of detection on y, both 0 to 1. Critical success index contours
 * follow CSI = 1 / (1/SR + 1/POD − 1), so for a given CSI c, POD = 1 / (1/c + 1 − 1/SR) for
 * SR ≥ c; frequency-bias lines are the rays POD = b · SR from the origin.
 */
export type UnitPoint = readonly [successRatio: number, pod: number];

/** Points along the CSI = c contour, from (c, 1) to (1, c). */
export function csiContour(csi: number, steps = 48): UnitPoint[] {
  if (!(csi > 0 && csi < 1)) throw new RangeError(`a CSI contour needs 0 < CSI < 1, got ${csi}`);
  const points: UnitPoint[] = [];
  for (let k = 0; k <= steps; k++) {
    const sr = csi + ((1 - csi) * k) / steps;
    points.push([sr, 1 / (1 / csi + 1 - 1 / sr)]);
  }
  return points;
}

/** The bias = b ray from the origin to where it leaves the unit square. */
export function biasLine(bias: number): [UnitPoint, UnitPoint] {
  if (!(bias > 0)) throw new RangeError(`a bias line needs bias > 0, got ${bias}`);
  return bias >= 1 ? [[0, 0], [1 / bias, 1]] : [[0, 0], [1, bias]];
}

export const CSI_CONTOURS = [0.1, 0.2, 0.3, 0.4, 0.5, 0.6, 0.7, 0.8, 0.9] as const;
export const BIAS_LINES = [0.25, 0.5, 0.8, 1, 1.3, 1.5, 2, 3, 5] as const;
