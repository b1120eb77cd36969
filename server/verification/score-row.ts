import type { LeadTimeDto } from "../../shared/api/verification.ts";
import { verificationScores, type VerificationCounts, type VerificationScores } from "../../shared/verification/contingency-scores.ts";
import type { MatchResult } from "../../shared/verification/match-reports.ts";
import { medianAndP90 } from "../../shared/verification/sample-quantile.ts";

export interface ScoredMatch {
  triggers: number;
  reports: number;
  counts: VerificationCounts;
  scores: VerificationScores;
  leadTime: LeadTimeDto;
}

/** Scores and the lead-time distribution from counts and the detected reports' lead times. */
export function scoreCounts(counts: VerificationCounts, leadMinutes: number[]): ScoredMatch {
  return {
    triggers: counts.verifiedTriggers + counts.falseAlarms,
    reports: counts.detectedReports + counts.misses,
    counts,
    scores: verificationScores(counts),
    leadTime: { ...medianAndP90(leadMinutes), minutes: leadMinutes },
  };
}

/** Counts, scores and the lead-time distribution of one match. */
export function scoreMatch(result: MatchResult): ScoredMatch {
  return scoreCounts(result.counts, result.leadTimesMinutes);
}
