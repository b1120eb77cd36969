/**
 * What the expression editor offers at the cursor: catalogue field keys (also found by their theme,
 * "shear" lists every shear field), the rule functions, the word operators, and, next to a category
 * field (`jet_quadrant == …`, `oneof(jet_quadrant, …)`), that field's category labels. Pure, so the
 * editor component only renders and applies the result.
 */
import { FIELDS, fieldByKey, type FieldDefinition } from "@shared/fields.ts";
import { RULE_FUNCTIONS } from "@shared/rules/index.ts";

export type CompletionKind = "field" | "function" | "category" | "operator";

export interface CompletionItem {
  kind: CompletionKind;
  label: string;
  /** Text that replaces the word at the cursor. */
  insertText: string;
  /** Where the cursor lands inside `insertText` once accepted (inside the parentheses of a function). */
  cursorOffset: number;
  /** One short line: unit and meaning, a signature, or a category code. */
  detail: string;
  /** The catalogue theme of a field, shown as a small group label. */
  group?: string;
}

export interface CompletionResult {
  /** The range of the word being completed: [from, to). */
  from: number;
  to: number;
  prefix: string;
  items: CompletionItem[];
}

export interface CompletionOptions {
  /** Asked for (Ctrl+Space): offer a list even before anything is typed. */
  explicit?: boolean;
  limit?: number;
}

const WORD_BEFORE = /[A-Za-z_][A-Za-z0-9_]*$/;
const WORD_AFTER = /^[A-Za-z0-9_]*/;
/** A forgiving token split for context only; the text may well be invalid while it is typed. */
const LOOSE_TOKEN = /[A-Za-z_][A-Za-z0-9_]*|\d+(?:\.\d*)?(?:[eE][+-]?\d+)?|\.\d+|<=|>=|==|!=|&&|\|\||\S/g;

function fieldItem(field: FieldDefinition): CompletionItem {
  const unit = field.kind === "number" ? field.display.unit || "no unit" : field.kind === "bool" ? "yes/no" : "category";
  return { kind: "field", label: field.key, insertText: field.key, cursorOffset: field.key.length, detail: `${unit} · ${field.meaning}`, group: field.theme };
}

const FUNCTION_ITEMS: readonly CompletionItem[] = RULE_FUNCTIONS.map((f) => ({
  kind: "function",
  label: f.name,
  insertText: `${f.name}()`,
  cursorOffset: f.name.length + 1,
  detail: `${f.signature} · ${f.summary}`,
}));

const OPERATOR_DETAIL: Record<string, string> = {
  and: "met where both sides are met",
  or: "met where either side is met",
  not: "negates a condition in parentheses",
};
const operatorItem = (word: string): CompletionItem => ({ kind: "operator", label: word, insertText: word, cursorOffset: word.length, detail: OPERATOR_DETAIL[word]! });

function looseTokens(text: string): string[] {
  return text.match(LOOSE_TOKEN) ?? [];
}

const isOperand = (token: string | undefined): boolean => token !== undefined && (/^[A-Za-z0-9_.]/.test(token) || token === ")") && !/^(and|or|not)$/i.test(token);

/** The category field whose labels fit at the cursor, if any. */
function categoryFieldInContext(before: string): FieldDefinition | null {
  const tokens = looseTokens(before);
  const last = tokens[tokens.length - 1];
  if (last === "==" || last === "!=") {
    const field = fieldByKey(tokens[tokens.length - 2] ?? "");
    return field?.kind === "category" ? field : null;
  }
  // Inside oneof( … ): walk back to the innermost open parenthesis.
  let depth = 0;
  for (let k = tokens.length - 1; k >= 0; k--) {
    const t = tokens[k]!;
    if (t === ")") depth++;
    else if (t === "(") {
      if (depth > 0) {
        depth--;
        continue;
      }
      if (tokens[k - 1]?.toLowerCase() !== "oneof") return null;
      const args = tokens.slice(k + 1);
      const firstComma = args.indexOf(",");
      // Labels fit only after the first argument, which must be the category field itself.
      if (firstComma < 0) return null;
      const field = fieldByKey(args.slice(0, firstComma).join(""));
      return field?.kind === "category" ? field : null;
    }
  }
  return null;
}

function rankedDefaults(prefix: string, before: string): CompletionItem[] {
  const lower = prefix.toLowerCase();
  const afterOperand = isOperand(looseTokens(before).at(-1));
  const ranked: Array<{ item: CompletionItem; rank: number }> = [];
  const seen = new Set<string>();
  const add = (item: CompletionItem, rank: number) => {
    if (seen.has(item.label)) return;
    seen.add(item.label);
    ranked.push({ item, rank });
  };
  // After a value only an operator can follow; the word operators are the ones worth offering.
  for (const word of afterOperand ? ["and", "or"] : ["not"]) if (word.startsWith(lower)) add(operatorItem(word), 0);
  if (afterOperand) return ranked.map((r) => r.item);
  for (const field of FIELDS) if (field.key.startsWith(lower)) add(fieldItem(field), 0);
  for (const fn of FUNCTION_ITEMS) if (fn.label.startsWith(lower)) add(fn, 0);
  if (lower.length >= 2) {
    for (const field of FIELDS) if (field.key.includes(lower)) add(fieldItem(field), 1);
    for (const field of FIELDS) if (field.theme.startsWith(lower)) add(fieldItem(field), 2);
  }
  // Stable sort keeps catalogue order inside a rank (fields grouped by theme, as the catalogue lists them).
  return ranked.sort((a, b) => a.rank - b.rank).map((r) => r.item);
}

/** The suggestions for the word at `cursor`, or null when there is nothing worth showing. */
export function completionsAt(text: string, cursor: number, options: CompletionOptions = {}): CompletionResult | null {
  const at = Math.max(0, Math.min(cursor, text.length));
  const before = text.slice(0, at);
  const prefix = WORD_BEFORE.exec(before)?.[0] ?? "";
  const from = at - prefix.length;
  // "1e5" or "10." : the letters belong to a number, not a name.
  if (from > 0 && /[0-9.]/.test(text[from - 1]!)) return null;
  if (prefix === "" && !options.explicit) return null;
  const to = at + (WORD_AFTER.exec(text.slice(at))?.[0].length ?? 0);
  const context = before.slice(0, from);

  const category = categoryFieldInContext(context);
  let items = category
    ? (category.categories ?? [])
        .filter((c) => c.label.startsWith(prefix.toLowerCase()))
        .map((c): CompletionItem => ({ kind: "category", label: c.label, insertText: c.label, cursorOffset: c.label.length, detail: `${category.key} code ${c.code}` }))
    : rankedDefaults(prefix, context);
  // A word typed out in full needs no list, unless the user asked for one.
  if (!options.explicit) items = items.filter((item) => item.label !== prefix);
  items = items.slice(0, options.limit ?? 40);
  return items.length > 0 ? { from, to, prefix, items } : null;
}

/** The text and cursor after accepting `item` in place of the word the result was computed for. */
export function applyCompletion(text: string, result: Pick<CompletionResult, "from" | "to">, item: CompletionItem): { text: string; cursor: number } {
  // Renaming a call that already has its parenthesis ("k|t(40)") must not add a second pair.
  if (item.kind === "function" && text[result.to] === "(") {
    return { text: text.slice(0, result.from) + item.label + text.slice(result.to), cursor: result.from + item.label.length + 1 };
  }
  const next = text.slice(0, result.from) + item.insertText + text.slice(result.to);
  return { text: next, cursor: result.from + item.cursorOffset };
}
