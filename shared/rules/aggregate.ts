/**
 * Sums up where a rule was met inside one zone of one frame, and decides the rule's spatial condition.
 *
 * Coverage counts only points where the rule could be decided: matched / (matched + decidedly not met),
 * within the zone. Points with missing data are left out of both, so a data gap neither dilutes nor
 * inflates the share. Each grid point counts as one; over a forecast zone the cell-area differences of
 * a conformal grid are small, and counting keeps coverage easy to explain.
 */
import { fieldByKey, type FieldKey } from "../fields.ts";
import { RuleEvaluationError, type FieldSource } from "./compile-rule.ts";

export interface MatchInput {
  /** 1 where the rule is met (CompiledRule.evaluate). */
  readonly met: Uint8Array;
  /** 1 where the rule is decidedly not met (CompiledRule.evaluateNotMet). */
  readonly notMet: Uint8Array;
  /** 1 at the zone's points; leave out to use the whole grid. */
  readonly zone?: Uint8Array;
  readonly fields: FieldSource;
  /** Fields to summarise over the matched points: the rule's fields plus any the spatial condition reads. */
  readonly summaryKeys: readonly FieldKey[];
}

/** A field over the matched points of the zone; null when no matched point has a value for it. */
export interface FieldSummary {
  readonly key: FieldKey;
  readonly max: number | null;
  readonly min: number | null;
  readonly mean: number | null;
  /** Matched points with a value for this field (a matched point may lack one when an `or` carried it). */
  readonly points: number;
}

export interface MatchSummary {
  readonly zonePoints: number;
  /** Zone points where the rule was met or decidedly not met. */
  readonly decidedPoints: number;
  readonly matchedPoints: number;
  /** matched / decided, in %; null when no zone point could be decided. */
  readonly coveragePercent: number | null;
  readonly fields: readonly FieldSummary[];
}

export function summariseMatches(input: MatchInput): MatchSummary {
  const { met, notMet, zone } = input;
  const n = met.length;
  if (notMet.length !== n) throw new RuleEvaluationError(`The "not met" mask has ${notMet.length} entries; the "met" mask has ${n}.`);
  if (zone && zone.length !== n) throw new RuleEvaluationError(`The zone mask has ${zone.length} entries; the frame has ${n} points.`);
  let zonePoints = 0;
  let matchedPoints = 0;
  let decidedPoints = 0;
  for (let i = 0; i < n; i++) {
    const inZone = zone ? zone[i] : 1;
    zonePoints += inZone;
    matchedPoints += inZone & met[i];
    decidedPoints += inZone & (met[i] | notMet[i]);
  }
  return {
    zonePoints,
    decidedPoints,
    matchedPoints,
    coveragePercent: decidedPoints === 0 ? null : (100 * matchedPoints) / decidedPoints,
    fields: input.summaryKeys.map((key) => summariseField(key, fieldArray(input.fields, key, n), met, zone)),
  };
}

function summariseField(key: FieldKey, data: Float32Array, met: Uint8Array, zone: Uint8Array | undefined): FieldSummary {
  let max = -Infinity;
  let min = Infinity;
  let sum = 0;
  let points = 0;
  for (let i = 0; i < data.length; i++) {
    const x = data[i];
    if (met[i] === 0 || (zone !== undefined && zone[i] === 0) || x !== x) continue;
    if (x > max) max = x;
    if (x < min) min = x;
    sum += x;
    points++;
  }
  return points === 0 ? { key, max: null, min: null, mean: null, points } : { key, max, min, mean: sum / points, points };
}

function fieldArray(fields: FieldSource, key: FieldKey, n: number): Float32Array {
  const data = fields(key);
  if (!(data instanceof Float32Array)) throw new RuleEvaluationError(`The frame has no Float32Array for field "${key}".`);
  if (data.length !== n) throw new RuleEvaluationError(`Field "${key}" has ${data.length} values; the frame has ${n} points.`);
  return data;
}

export type ExtremeComparison = ">=" | ">" | "<=" | "<";

/** How much of a zone must match before the rule counts as met there. */
export type SpatialCondition =
  | { readonly kind: "any-point" }
  | { readonly kind: "min-points"; readonly points: number }
  | { readonly kind: "min-coverage"; readonly percent: number }
  /** The zone's largest (or smallest) value of a field, over the matched points, beyond a value. */
  | {
      readonly kind: "zone-extreme";
      readonly statistic: "max" | "min";
      readonly field: FieldKey;
      readonly comparison: ExtremeComparison;
      readonly value: number;
    };

export interface SpatialDecision {
  readonly met: boolean;
  /** One plain sentence for the timeline and the trigger page. */
  readonly reason: string;
}

export function evaluateSpatialCondition(condition: SpatialCondition, summary: MatchSummary): SpatialDecision {
  const matched = summary.matchedPoints;
  if (summary.zonePoints === 0) return { met: false, reason: "The zone covers no grid point." };
  if (matched === 0) return { met: false, reason: "No point of the zone met the expression." };
  const points = `${matched} ${matched === 1 ? "point" : "points"} met the expression`;
  switch (condition.kind) {
    case "any-point":
      return { met: true, reason: `${points}; any point is enough.` };
    case "min-points": {
      const met = matched >= condition.points;
      return { met, reason: `${points}; at least ${condition.points} required.` };
    }
    case "min-coverage": {
      const coverage = summary.coveragePercent ?? 0;
      const met = coverage >= condition.percent;
      return { met, reason: `${points}: ${formatValue(coverage)} % of the zone's points with data; at least ${formatValue(condition.percent)} % required.` };
    }
    case "zone-extreme":
      return decideExtreme(condition, summary);
  }
}

function decideExtreme(condition: Extract<SpatialCondition, { kind: "zone-extreme" }>, summary: MatchSummary): SpatialDecision {
  const field = summary.fields.find((f) => f.key === condition.field);
  if (!field) throw new RuleEvaluationError(`Field "${condition.field}" was not summarised; add it to summaryKeys.`);
  const label = `${condition.statistic === "max" ? "Maximum" : "Minimum"} ${condition.field} over the matched points`;
  const wanted = `${condition.comparison} ${formatValue(condition.value)}${unitSuffix(condition.field)}`;
  const value = condition.statistic === "max" ? field.max : field.min;
  if (value === null) return { met: false, reason: `${label} is unknown (no data); needs ${wanted}.` };
  const met = beyond(value, condition.comparison, condition.value);
  return { met, reason: `${label} is ${formatValue(value)}${unitSuffix(condition.field)}; needs ${wanted}.` };
}

function beyond(value: number, comparison: ExtremeComparison, threshold: number): boolean {
  switch (comparison) {
    case ">=":
      return value >= threshold;
    case ">":
      return value > threshold;
    case "<=":
      return value <= threshold;
    case "<":
      return value < threshold;
  }
}

/** Four significant digits: enough to compare with a threshold, short enough for a sentence. */
function formatValue(v: number): string {
  return String(Number(v.toPrecision(4)));
}

function unitSuffix(key: FieldKey): string {
  const unit = fieldByKey(key)?.unit;
  return unit && unit !== "1" ? ` ${unit}` : "";
}
