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

/** Counts, scores and the lead-time distribution of one match. */
export function scoreMatch(result: MatchResult): ScoredMatch {
  return {
    triggers: result.triggers.length,
    reports: result.reports.length,
    counts: result.counts,
    scores: verificationScores(result.counts),
    leadTime: { ...medianAndP90(result.leadTimesMinutes), minutes: result.leadTimesMinutes },
  };
}
