/**
 * Checks the order of tokens before the parser sees them, so every syntax mistake gets an exact position
 * (expr-eval-fork reports many of them without one). For an infix grammar like ours, "what may follow
 * what" plus balanced parentheses is the whole of syntax; the parser then only has to apply precedence.
 */
import type { RuleError, RuleErrorCode } from "./rule-ast.ts";
import type { RuleToken } from "./tokenize-rule.ts";

/** Deeper nesting than this is surely a mistake, and it keeps the recursive parser far from the stack limit. */
export const MAX_NESTING_DEPTH = 32;

const PREFIX_OPERATORS = new Set(["-", "+", "not"]);

export interface SyntaxStructure {
  /** For each "(" token index, the index of its ")"; -1 for other tokens. */
  readonly matching: readonly number[];
  /** True at "(" tokens that open a function call's argument list. */
  readonly callOpen: readonly boolean[];
}

export type SyntaxCheckResult =
  | { readonly ok: true; readonly structure: SyntaxStructure }
  | { readonly ok: false; readonly error: RuleError };

export function checkSyntax(tokens: readonly RuleToken[]): SyntaxCheckResult {
  const matching = tokens.map(() => -1);
  const callOpen = tokens.map(() => false);
  const open: number[] = [];
  let expectValue = true;
  for (let i = 0; i < tokens.length; i++) {
    const t = tokens[i];
    const previous = i > 0 ? tokens[i - 1] : undefined;
    if (expectValue) {
      if (t.kind === "name" || t.kind === "number") {
        expectValue = false;
      } else if (t.kind === "open") {
        open.push(i);
      } else if (t.kind === "operator" && PREFIX_OPERATORS.has(t.canonical)) {
        // stays expecting a value
      } else if (t.kind === "close" && previous?.kind === "open" && callOpen[i - 1]) {
        matching[open.pop()!] = i; // f(): the argument count is checked later, with a clearer message
        expectValue = false;
      } else {
        return fail("SYNTAX_ERROR", missingValueMessage(t, previous), t);
      }
    } else if (t.kind === "operator" && t.canonical !== "not") {
      expectValue = true;
    } else if (t.kind === "open" && previous?.kind === "name") {
      callOpen[i] = true;
      open.push(i);
      expectValue = true;
    } else if (t.kind === "close") {
      const o = open.pop();
      if (o === undefined) return fail("UNBALANCED_PARENTHESIS", 'This ")" has no matching "(".', t);
      matching[o] = i;
    } else if (t.kind === "comma") {
      if (open.length === 0 || !callOpen[open[open.length - 1]]) {
        return fail("SYNTAX_ERROR", "A comma only separates the values given to a function, as in max(a, b).", t);
      }
      expectValue = true;
    } else {
      return fail("SYNTAX_ERROR", missingOperatorMessage(previous!, t), t);
    }
    if (open.length > MAX_NESTING_DEPTH) {
      return fail("TOO_DEEPLY_NESTED", `Parentheses are nested more than ${MAX_NESTING_DEPTH} deep.`, t);
    }
  }
  if (tokens.length === 0) return { ok: false, error: { code: "EMPTY_EXPRESSION", message: "The expression is empty.", position: 0, length: 0 } };
  if (expectValue) {
    const last = tokens[tokens.length - 1];
    return fail("SYNTAX_ERROR", `The expression ends after "${last.text}"; a value should follow it.`, last);
  }
  if (open.length > 0) return fail("UNBALANCED_PARENTHESIS", 'This "(" is never closed.', tokens[open[open.length - 1]]);
  return { ok: true, structure: { matching, callOpen } };
}

function missingValueMessage(t: RuleToken, previous: RuleToken | undefined): string {
  const where = previous ? `after "${previous.text}"` : "at the start";
  if (t.kind === "close") return `Expected a value ${where}, before ")".`;
  return `Expected a value ${where}, but found "${t.text}".`;
}

function missingOperatorMessage(previous: RuleToken, t: RuleToken): string {
  if (t.kind === "operator") return `"${t.text}" cannot follow a value here. Did you mean "and ${t.text}"?`;
  if (t.kind === "open") return `An operator is missing between "${previous.text}" and "(".`;
  return `An operator is missing between "${previous.text}" and "${t.text}".`;
}

function fail(code: RuleErrorCode, message: string, at: RuleToken): SyntaxCheckResult {
  return { ok: false, error: { code, message, position: at.position, length: at.length } };
}
