import { compileRule, parseRuleOrThrow, summariseMatches, evaluateSpatialCondition, type CompiledRule, type MatchSummary } from "../../shared/rules/index.ts";
import type { RuleDefinition } from "../../shared/api/rules.ts";
import type { FieldKey } from "../../shared/fields.ts";
import type { FrameFields } from "./frame-fields.ts";

export interface ZoneOutcome {
  zoneId: number;
  met: boolean;
  reason: string;
  summary: MatchSummary;
}

export interface VersionOutcome {
  /** Fields the rule needs that the frame does not have; when set, nothing was evaluated. */
  missingFields: string[];
  zones: ZoneOutcome[];
  /** 1 where the expression is met (whole grid), for maps and previews. */
  met: Uint8Array | null;
}

/** Compiled rules by version id: each version is parsed and compiled once per process. */
const compiled = new Map<string, { rule: CompiledRule; keys: FieldKey[] }>();

export function compiledFor(cacheKey: string, expression: string): { rule: CompiledRule; keys: FieldKey[] } {
  let entry = compiled.get(cacheKey);
  if (!entry) {
    const checked = parseRuleOrThrow(expression);
    entry = { rule: compileRule(checked), keys: [...checked.fieldKeys] };
    compiled.set(cacheKey, entry);
    if (compiled.size > 2000) compiled.delete(compiled.keys().next().value!);
  }
  return entry;
}

/** Fields a definition reads: the expression's and the one a zone-extreme condition looks at. */
export function fieldsOf(definition: Pick<RuleDefinition, "spatialCondition">, expressionKeys: readonly FieldKey[]): FieldKey[] {
  const keys = new Set<FieldKey>(expressionKeys);
  if (definition.spatialCondition.kind === "zone-extreme") keys.add(definition.spatialCondition.field);
  return [...keys];
}

/**
 * One rule version on one frame: the expression over whole arrays once, then each zone's summary
 * and spatial decision. `zoneMasks` gives each zone's mask on this frame's grid.
 */
export async function evaluateVersionOnFrame(
  cacheKey: string,
  definition: Pick<RuleDefinition, "expression" | "spatialCondition">,
  fields: FrameFields,
  zoneMasks: ReadonlyArray<{ zoneId: number; mask: Uint8Array }>,
): Promise<VersionOutcome> {
  const { rule, keys } = compiledFor(cacheKey, definition.expression);
  const summaryKeys = fieldsOf(definition, keys);
  const missingFields = await fields.load(summaryKeys);
  if (missingFields.length > 0) {
    const reason = `The frame has no ${missingFields.join(", ")} field, so the rule could not be checked.`;
    return {
      missingFields,
      met: null,
      zones: zoneMasks.map(({ zoneId }) => ({ zoneId, met: false, reason, summary: { zonePoints: 0, decidedPoints: 0, matchedPoints: 0, coveragePercent: null, fields: [] } })),
    };
  }
  const source = (key: FieldKey) => fields.get(key);
  const n = fields.pointCount;
  const met = rule.evaluate(source, n);
  const notMet = rule.evaluateNotMet(source, n);
  const zones = zoneMasks.map(({ zoneId, mask }) => {
    const summary = summariseMatches({ met, notMet, zone: mask, fields: source, summaryKeys });
    const decision = evaluateSpatialCondition(definition.spatialCondition, summary);
    return { zoneId, met: decision.met, reason: decision.reason, summary };
  });
  return { missingFields: [], zones, met };
}
