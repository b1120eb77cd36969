/**
 * Inverse of the CCSDS 121.0-B-2 preprocessor (section 4): a unit-delay predictor, whose prediction is the
 * previous sample, followed by the prediction-error mapper. Given the mapped residual delta and the prediction,
 * returns the sample. theta = min(prediction - min, max - prediction); residuals up to 2 theta alternate
 * 0, -1, +1, -2, ...; beyond that they run one way only, away from the nearer limit.
 */
export function unmapResidual(delta: number, prediction: number, minimum: number, maximum: number): number {
  const below = prediction - minimum;
  const above = maximum - prediction;
  const theta = below < above ? below : above;
  if (delta <= 2 * theta) {
    return delta % 2 === 0 ? prediction + delta / 2 : prediction - (delta + 1) / 2;
  }
  return below <= above ? prediction + (delta - theta) : prediction - (delta - theta);
}
