/**
 * Reads a rule expression and checks it against the field catalogue. Runs in the browser (live
 * validation in the rule editor) and on the server (the same checks before a rule is saved or run).
 *
 * Steps: tokenize (refuses left-out constructs with exact positions) -> order check (syntax mistakes
 * with exact positions) -> expr-eval-fork parse of the canonical token text (operator precedence) ->
 * syntax tree with token ranges -> type check against the catalogue -> typed tree, used fields, and a
 * normalised text.
 */
import { buildSyntaxTree, TreeBuildError, type SyntaxNode } from "./build-syntax-tree.ts";
import { checkSyntax } from "./check-syntax.ts";
import { RuleTypeChecker } from "./check-rule-types.ts";
import { formatRule } from "./format-rule.ts";
import type { RuleError, RuleParseResult } from "./rule-ast.ts";
import { tokenizeRule } from "./tokenize-rule.ts";

/** Long enough for any sensible rule (the longest starter rule is about 120 characters). */
export const MAX_EXPRESSION_LENGTH = 2000;

export function parseRule(expression: string): RuleParseResult {
  if (expression.trim() === "") return failure({ code: "EMPTY_EXPRESSION", message: "The expression is empty.", position: 0, length: expression.length });
  if (expression.length > MAX_EXPRESSION_LENGTH) {
    return failure({
      code: "EXPRESSION_TOO_LONG",
      message: `The expression is ${expression.length} characters long; the limit is ${MAX_EXPRESSION_LENGTH}.`,
      position: MAX_EXPRESSION_LENGTH,
      length: expression.length - MAX_EXPRESSION_LENGTH,
    });
  }
  const lexed = tokenizeRule(expression);
  if (!lexed.ok) return { ok: false, errors: lexed.errors };
  const syntax = checkSyntax(lexed.tokens);
  if (!syntax.ok) return failure(syntax.error);

  let tree: SyntaxNode;
  try {
    tree = buildSyntaxTree(lexed.tokens, syntax.structure);
  } catch (cause) {
    // The token checks should leave the parser nothing to object to; if it does, say so plainly.
    const detail = cause instanceof TreeBuildError || cause instanceof Error ? cause.message : String(cause);
    return failure({ code: "SYNTAX_ERROR", message: `The expression could not be read (${detail}).`, position: 0, length: expression.length });
  }

  const checker = new RuleTypeChecker(expression, lexed.tokens);
  const root = checker.checkRoot(tree);
  if (!root) return { ok: false, errors: checker.errors };
  return {
    ok: true,
    rule: { expression, root, fieldKeys: [...checker.fieldKeys], normalised: formatRule(root) },
  };
}

/** Thrown by `parseRuleOrThrow` with every problem attached, for callers without an editor (CLI, jobs). */
export class RuleExpressionError extends Error {
  constructor(readonly errors: readonly RuleError[]) {
    super(errors.map((e) => `${e.message} (at character ${e.position + 1})`).join("\n"));
    this.name = "RuleExpressionError";
  }
}

export function parseRuleOrThrow(expression: string) {
  const result = parseRule(expression);
  if (!result.ok) throw new RuleExpressionError(result.errors);
  return result.rule;
}

function failure(error: RuleError): RuleParseResult {
  return { ok: false, errors: [error] };
}
