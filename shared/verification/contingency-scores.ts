/**
 * Scores of a yes/no forecast against observed events. Bellwether counts the two sides of the
 * table separately, as warning verification does: triggers are the forecasts (each either verified
 * by at least one report, or a false alarm) and reports are the events (each either detected by at
 * least one trigger, or missed). When every trigger matches exactly one report and every report
 * one trigger, verified triggers equal detected reports and the counts form the ordinary 2 × 2
 * table of Wilks (2011), §8.2, with a = hits, b = false alarms, c = misses.
 */

export interface VerificationCounts {
  /** Triggers matched by at least one report. */
  verifiedTriggers: number;
  /** Triggers that no report matched. */
  falseAlarms: number;
  /** Reports matched by at least one trigger. */
  detectedReports: number;
  /** Reports that no trigger matched. */
  misses: number;
}

/** Each score is null where its denominator is zero (nothing to score). */
export interface VerificationScores {
  /** Probability of detection: detected reports ÷ all reports. */
  pod: number | null;
  /** False-alarm ratio: false alarms ÷ all triggers. */
  far: number | null;
  /** Success ratio, 1 − FAR: the x axis of the performance diagram. */
  successRatio: number | null;
  /** Critical success index (threat score). */
  csi: number | null;
  /** Frequency bias: triggers ÷ reports. */
  bias: number | null;
}

const ratio = (numerator: number, denominator: number): number | null => (denominator > 0 ? numerator / denominator : null);

/**
 * CSI from POD and success ratio: Roebber (2009), the relation behind the performance diagram,
 * CSI = 1 / (1/SR + 1/POD − 1), written as POD·SR / (POD + SR − POD·SR) so a zero POD or SR
 * gives 0 rather than a division by zero. With one-to-one matches it equals a / (a + b + c).
 */
export function csiFromPodAndSuccessRatio(pod: number, successRatio: number): number {
  const denominator = pod + successRatio - pod * successRatio;
  return denominator > 0 ? (pod * successRatio) / denominator : 0;
}

/**
 * POD = a / (a + c), FAR = b / (a + b) and frequency bias = (a + b) / (a + c) after Wilks (2011),
 * §8.2.2, with a counted on each side of the table as described above; CSI after Roebber (2009).
 */
export function verificationScores(counts: VerificationCounts): VerificationScores {
  const triggers = counts.verifiedTriggers + counts.falseAlarms;
  const reports = counts.detectedReports + counts.misses;
  const pod = ratio(counts.detectedReports, reports);
  const far = ratio(counts.falseAlarms, triggers);
  const successRatio = far === null ? null : 1 - far;
  const csi = pod === null || successRatio === null ? null : csiFromPodAndSuccessRatio(pod, successRatio);
  return { pod, far, successRatio, csi, bias: ratio(triggers, reports) };
}

/** An ordinary 2 × 2 contingency table (Wilks 2011, Table 8.1 layout). */
export interface ContingencyTable {
  hits: number;
  falseAlarms: number;
  misses: number;
  correctNegatives: number;
}

/** The 2 × 2 table as Bellwether's counts: each hit is one verified trigger and one detected report. */
export function countsFromTable(table: ContingencyTable): VerificationCounts {
  return { verifiedTriggers: table.hits, falseAlarms: table.falseAlarms, detectedReports: table.hits, misses: table.misses };
}

/** Proportion correct, (a + d) / n: Wilks (2011), §8.2.2. Needs the correct negatives Bellwether does not count. */
export function proportionCorrect(table: ContingencyTable): number | null {
  const n = table.hits + table.falseAlarms + table.misses + table.correctNegatives;
  return ratio(table.hits + table.correctNegatives, n);
}
