/**
 * Splits a rule expression into tokens with their positions, refusing at once every construct the
 * language leaves out (strings, member access, arrays, assignment, conditionals, statements, comments).
 * Only tokens that pass here are ever handed to expr-eval-fork, rebuilt from their canonical text, so
 * the library never sees a character the user typed outside this small alphabet.
 */
import type { RuleError, RuleErrorCode, SourceSpan } from "./rule-ast.ts";

export type RuleTokenKind = "name" | "number" | "operator" | "open" | "close" | "comma";

export interface RuleToken extends SourceSpan {
  readonly kind: RuleTokenKind;
  /** As typed. */
  readonly text: string;
  /** The spelling passed to the parser: `&&` -> `and`, `||` -> `or`, `!` -> `not`, word operators in lower case. */
  readonly canonical: string;
}

export type TokenizeResult =
  | { readonly ok: true; readonly tokens: readonly RuleToken[] }
  | { readonly ok: false; readonly errors: readonly RuleError[] };

/** A Map, not an object literal: a name like `constructor` must not find an inherited key. */
const WORD_OPERATORS: ReadonlyMap<string, string> = new Map([["and", "and"], ["or", "or"], ["not", "not"]]);
const NAME = /[A-Za-z_][A-Za-z0-9_]*/y;
const NUMBER = /(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?/y;
const WHITESPACE = /[ \t\r\n]+/y;

/** Symbol operators, longest first so `<=` wins over `<`. */
const SYMBOL_OPERATORS: readonly (readonly [string, string])[] = [
  ["<=", "<="],
  [">=", ">="],
  ["==", "=="],
  ["!=", "!="],
  ["&&", "and"],
  ["||", "or"],
  ["<", "<"],
  [">", ">"],
  ["+", "+"],
  ["-", "-"],
  ["*", "*"],
  ["/", "/"],
  ["^", "^"],
  ["!", "not"],
];

export function tokenizeRule(text: string): TokenizeResult {
  const tokens: RuleToken[] = [];
  const errors: RuleError[] = [];
  let pos = 0;
  while (pos < text.length) {
    const whitespace = matchAt(WHITESPACE, text, pos);
    if (whitespace) {
      pos += whitespace.length;
      continue;
    }
    const token = readToken(text, pos);
    if ("code" in token) {
      errors.push(token);
      pos = token.position + Math.max(1, token.length);
    } else {
      tokens.push(token);
      pos += token.length;
    }
  }
  return errors.length > 0 ? { ok: false, errors } : { ok: true, tokens };
}

function readToken(text: string, pos: number): RuleToken | RuleError {
  const c = text[pos];
  const name = matchAt(NAME, text, pos);
  if (name) {
    const word = WORD_OPERATORS.get(name.toLowerCase());
    return token(word ? "operator" : "name", name, word ?? name, pos);
  }
  const number = matchAt(NUMBER, text, pos);
  if (number) return readNumber(text, number, pos);
  if (c === "(" || c === ")") return token(c === "(" ? "open" : "close", c, c, pos);
  if (c === ",") return token("comma", c, c, pos);
  const refused = refusedConstruct(text, pos);
  if (refused) return refused;
  for (const [symbol, canonical] of SYMBOL_OPERATORS) {
    if (text.startsWith(symbol, pos)) return token("operator", symbol, canonical, pos);
  }
  const shown = c.trim() === "" ? `U+${c.charCodeAt(0).toString(16).toUpperCase().padStart(4, "0")}` : `"${c}"`;
  return error("UNEXPECTED_CHARACTER", `Unexpected character ${shown}. Rules use field names, numbers, operators and parentheses.`, pos, 1);
}

function readNumber(text: string, number: string, pos: number): RuleToken | RuleError {
  const after = text[pos + number.length];
  if (after !== undefined && /[A-Za-z_]/.test(after)) {
    const whole = matchAt(/[A-Za-z0-9_.]+/y, text, pos) ?? number;
    return error(
      "INVALID_NUMBER",
      `"${whole}" is not a number. Write plain decimal numbers without units (thresholds in knots: kt(40)).`,
      pos,
      whole.length,
    );
  }
  if (!Number.isFinite(Number(number))) {
    return error("INVALID_NUMBER", `The number "${number}" is too large.`, pos, number.length);
  }
  return token("number", number, number, pos);
}

/** The characters of constructs the language leaves out, each with a message that says what to do instead. */
function refusedConstruct(text: string, pos: number): RuleError | undefined {
  const c = text[pos];
  const next = text[pos + 1];
  if (c === "'" || c === '"' || c === "`") {
    const close = text.indexOf(c, pos + 1);
    const end = close < 0 ? text.length : close + 1;
    return error("STRING_NOT_ALLOWED", "Text in quotes is not allowed in rules; compare fields with numbers.", pos, end - pos);
  }
  if (c === "/" && (next === "*" || next === "/")) {
    return error("COMMENT_NOT_ALLOWED", "Comments are not allowed in expressions; explain the rule in its description.", pos, text.length - pos);
  }
  if (c === ".") {
    return error("MEMBER_ACCESS_NOT_ALLOWED", 'A "." is not allowed here: rules read catalogue fields by name only.', pos, 1);
  }
  if (c === "[" || c === "]" || c === "{" || c === "}") {
    return error("ARRAY_NOT_ALLOWED", `"${c}" is not allowed: rules have no lists or objects. Use oneof(field, a, b) to test several codes.`, pos, 1);
  }
  if (c === "=" && next !== "=") {
    const hint = next === ">" || next === "<" ? "Write >= or <= to compare." : "Use == to compare; rules cannot assign values or define functions.";
    return error("ASSIGNMENT_NOT_ALLOWED", `A single "=" is not allowed. ${hint}`, pos, 1);
  }
  if (c === ";") return error("MULTIPLE_STATEMENTS", 'A rule is one expression; ";" is not allowed.', pos, 1);
  if (c === "?" || c === ":") {
    return error("CONDITIONAL_NOT_ALLOWED", `"${c}" is not allowed: rules have no if/else. Join conditions with and / or.`, pos, 1);
  }
  if (c === "%") return error("UNSUPPORTED_OPERATOR", '"%" (remainder) is not part of the rule language.', pos, 1);
  if ((c === "&" && next !== "&") || (c === "|" && next !== "|")) {
    return error("UNSUPPORTED_OPERATOR", `A single "${c}" is not an operator. Write ${c === "&" ? "and" : "or"}.`, pos, 1);
  }
  return undefined;
}

function matchAt(pattern: RegExp, text: string, pos: number): string | undefined {
  pattern.lastIndex = pos;
  const m = pattern.exec(text);
  return m ? m[0] : undefined;
}

function token(kind: RuleTokenKind, text: string, canonical: string, position: number): RuleToken {
  return { kind, text, canonical, position, length: text.length };
}

function error(code: RuleErrorCode, message: string, position: number, length: number): RuleError {
  return { code, message, position, length };
}
