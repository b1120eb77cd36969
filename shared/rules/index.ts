/**
 * The rule engine's public surface: parse and check an expression, compile it once, evaluate it over a
 * frame, sum up a zone, decide the spatial condition and persistence. Everything else in this folder is
 * an implementation detail.
 */
export { parseRule, parseRuleOrThrow, RuleExpressionError, MAX_EXPRESSION_LENGTH } from "./parse-rule.ts";
export type { CheckedRule, RuleError, RuleErrorCode, RuleParseResult, SourceSpan, ConditionNode, NumberNode } from "./rule-ast.ts";
export { compileRule, RuleEvaluationError, type CompiledRule, type FieldSource } from "./compile-rule.ts";
export { summariseMatches, evaluateSpatialCondition } from "./aggregate.ts";
export type { MatchInput, MatchSummary, FieldSummary, SpatialCondition, SpatialDecision, ExtremeComparison } from "./aggregate.ts";
export { findPersistentRuns, type FrameOutcome, type PersistenceOptions, type PersistenceResult } from "./persistence.ts";
export { isWithinValidTimeWindow, type ValidTimeWindow } from "./valid-time-window.ts";
export { SEVERITY_KEYS, SEVERITY_LEVELS, severityLevel, compareSeverity, isSeverityRise, type Severity, type SeverityLevel } from "./severity.ts";
export { RULE_FUNCTIONS, METRES_PER_SECOND_PER_KNOT, type RuleFunctionInfo, type RuleFunctionName } from "./rule-functions.ts";
