import { isSeverityRise, type Severity } from "../../shared/rules/severity.ts";

/**
 * What one evaluated frame means for a rule in a zone: open a trigger, extend an active one,
 * take back a valid time an active one no longer matches (clearing it when none is left), hold it
 * back for the cool-down, or nothing. Pure: the caller loads the triggers and stores the result.
 */
export interface ActiveTriggerView {
  id: number;
  severity: Severity;
  runTime: string;
  firstValidTime: string;
  lastValidTime: string;
  matchedValidTimes: readonly string[];
}

export interface ClosedTriggerView {
  severity: Severity;
  lastValidTime: string;
}

export interface FrameResult {
  runTime: string;
  validTime: string;
  /** The expression and spatial condition held in this frame. */
  met: boolean;
  /**
   * With persistence: the valid times of the streak of met frames (of this run) that this frame
   * belongs to, when that streak is at least K long; null when it is not (yet).
   */
  qualifyingStreak: readonly string[] | null;
}

export interface DecisionInput {
  ruleId: number;
  zoneId: number;
  severity: Severity;
  coolDownHours: number;
  result: FrameResult;
  /** Active (open or acknowledged) triggers of this rule and zone. */
  active: readonly ActiveTriggerView[];
  /** The most recent closed trigger of this rule and zone, if any. */
  lastClosed: ClosedTriggerView | null;
}

export type TriggerDecision =
  | { action: "open"; key: string; firstValidTime: string; lastValidTime: string; matchedValidTimes: string[]; reason: string }
  | {
      action: "extend";
      triggerId: number;
      firstValidTime: string;
      lastValidTime: string;
      matchedValidTimes: string[];
      runTime: string;
      severityRose: boolean;
      /** True when the frame adds a valid time or a newer run: worth an "updated" event. */
      changed: boolean;
      reason: string;
    }
  | { action: "retract"; triggerId: number; matchedValidTimes: string[]; clear: boolean; reason: string }
  | { action: "suppress"; reason: string }
  | { action: "none"; reason: string };

const HOUR = 3_600_000;
const ms = (iso: string) => Date.parse(iso);
const sortTimes = (times: Iterable<string>) => [...new Set(times)].sort((a, b) => ms(a) - ms(b));

/** The active trigger whose event window, widened by the cool-down, holds the valid time (nearest first). */
function activeFor(active: readonly ActiveTriggerView[], validTime: string, coolDownHours: number): ActiveTriggerView | null {
  const v = ms(validTime);
  const widen = Math.max(coolDownHours, 1) * HOUR;
  const holding = active.filter((t) => v >= ms(t.firstValidTime) - widen && v <= ms(t.lastValidTime) + widen);
  holding.sort((a, b) => Math.abs(ms(a.lastValidTime) - v) - Math.abs(ms(b.lastValidTime) - v));
  return holding[0] ?? null;
}

export function decideTrigger(input: DecisionInput): TriggerDecision {
  const { result, coolDownHours } = input;
  if (!result.met) return retractIfMatched(input);
  if (!result.qualifyingStreak) return { action: "none", reason: "Met in this frame, but not yet in enough consecutive frames." };

  const streak = sortTimes(result.qualifyingStreak);
  const target = activeFor(input.active, result.validTime, coolDownHours);
  if (target) {
    const newerRun = ms(result.runTime) > ms(target.runTime);
    const matched = sortTimes([...target.matchedValidTimes, ...streak]);
    const severityRose = isSeverityRise(target.severity, input.severity);
    const changed = newerRun || !target.matchedValidTimes.includes(result.validTime) || severityRose;
    return {
      action: "extend",
      triggerId: target.id,
      firstValidTime: sortTimes([target.firstValidTime, ...streak])[0]!,
      lastValidTime: sortTimes([target.lastValidTime, ...streak]).at(-1)!,
      matchedValidTimes: matched,
      runTime: newerRun ? result.runTime : target.runTime,
      severityRose,
      changed,
      reason: changed ? `Still met at ${result.validTime} (run ${result.runTime}).` : "Already recorded.",
    };
  }

  const closed = input.lastClosed;
  if (closed && Math.abs(ms(streak[0]!) - ms(closed.lastValidTime)) < coolDownHours * HOUR && !isSeverityRise(closed.severity, input.severity)) {
    return { action: "suppress", reason: `Held back: a trigger for this rule and zone ended within the ${coolDownHours} h cool-down and the severity has not risen.` };
  }
  return {
    action: "open",
    key: `${input.ruleId}:${input.zoneId}:${streak[0]}`,
    firstValidTime: streak[0]!,
    lastValidTime: streak.at(-1)!,
    matchedValidTimes: streak,
    reason: `Met at ${streak.length === 1 ? streak[0] : `${streak.length} consecutive valid times from ${streak[0]}`} (run ${result.runTime}).`,
  };
}

function retractIfMatched(input: DecisionInput): TriggerDecision {
  const { result } = input;
  const target = input.active.find((t) => t.matchedValidTimes.includes(result.validTime) && ms(result.runTime) >= ms(t.runTime));
  if (!target) return { action: "none", reason: "Not met." };
  const matched = target.matchedValidTimes.filter((t) => t !== result.validTime);
  return {
    action: "retract",
    triggerId: target.id,
    matchedValidTimes: matched,
    clear: matched.length === 0,
    reason:
      matched.length === 0
        ? `Run ${result.runTime} no longer meets the rule at any of the trigger's valid times.`
        : `Run ${result.runTime} no longer meets the rule at ${result.validTime}.`,
  };
}
