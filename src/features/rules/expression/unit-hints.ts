/**
 * Unit hints beside the expression: each field the text names, in its storage unit (the unit a
 * threshold is written in) and its display unit, with every threshold compared against it turned into
 * the display unit ("shear_0_6km >= 20": 20 m/s ≈ 39 kt), and every kt(…) turned into m/s.
 * Works on a loose token scan, so hints stay useful while the expression is still invalid.
 */
import { fieldByKey, toDisplayUnit, type FieldDefinition } from "@shared/fields.ts";
import { METRES_PER_SECOND_PER_KNOT } from "@shared/rules/index.ts";
import { formatNumber, formatStorageUnit } from "@/lib/format-units.ts";

export interface FieldUnitHint {
  key: string;
  /** What a threshold for this field is written in ("m/s", "J/kg", "" when dimensionless). */
  storageUnit: string;
  /** The unit screens show it in, when different ("kt"). */
  displayUnit: string | null;
  /** One plain sentence for yes/no and category fields (how to test them). */
  note: string | null;
  /** Thresholds found next to the field, converted ("20 m/s ≈ 39 kt"). */
  conversions: string[];
}

export interface UnitHints {
  fields: FieldUnitHint[];
  /** kt(…) calls turned into the m/s they stand for ("kt(40) = 20.6 m/s"). */
  knots: string[];
}

const TOKEN = /[A-Za-z_][A-Za-z0-9_]*|\d+(?:\.\d*)?(?:[eE][+-]?\d+)?|\.\d+|<=|>=|==|!=|\S/g;
const COMPARISONS = new Set(["<", "<=", ">", ">=", "==", "!="]);
const ARITHMETIC = new Set(["+", "-", "*", "/", "^"]);
const MIRRORED: Record<string, string> = { "<": ">", "<=": ">=", ">": "<", ">=": "<=", "==": "==", "!=": "!=" };
const isNumber = (t: string | undefined): t is string => t !== undefined && /^(\d|\.\d)/.test(t);

function noteFor(field: FieldDefinition): string | null {
  if (field.kind === "bool") return "yes/no: use it on its own, with not, or with == 1 / == 0";
  if (field.kind === "category") return `category: ${(field.categories ?? []).map((c) => `${c.code} ${c.label}`).join(", ")}`;
  return null;
}

function conversion(field: FieldDefinition, op: string, text: string, negative: boolean): string | null {
  if (field.kind !== "number") return null;
  const value = Number(text) * (negative ? -1 : 1);
  const storage = formatStorageUnit(field.unit);
  const written = `${negative ? "−" : ""}${text}${storage ? ` ${storage}` : ""}`;
  if (field.display.scale === 1 && field.display.offset === 0) return null;
  const shown = formatNumber(toDisplayUnit(field, value), field.display.decimals);
  return `${field.key} ${op} ${written} ≈ ${shown} ${field.display.unit}`;
}

/** Each field's units and every threshold written beside it. */
export function unitHintsFor(expression: string): UnitHints {
  const tokens = expression.match(TOKEN) ?? [];
  const byKey = new Map<string, FieldUnitHint>();
  const knots: string[] = [];
  const hintFor = (field: FieldDefinition) => {
    let hint = byKey.get(field.key);
    if (!hint) {
      const storageUnit = formatStorageUnit(field.unit);
      const displayUnit = field.kind === "number" && field.display.unit !== storageUnit ? field.display.unit || null : null;
      hint = { key: field.key, storageUnit, displayUnit, note: noteFor(field), conversions: [] };
      byKey.set(field.key, hint);
    }
    return hint;
  };
  tokens.forEach((token, k) => {
    const field = fieldByKey(token);
    if (field) {
      const hint = hintFor(field);
      // field OP [-]number
      const op = tokens[k + 1];
      if (op && COMPARISONS.has(op)) {
        const negative = tokens[k + 2] === "-";
        const at = k + (negative ? 3 : 2);
        const number = tokens[at];
        // "20 * 2" is not a plain threshold; say nothing rather than something half right.
        const plain = isNumber(number) && !ARITHMETIC.has(tokens[at + 1] ?? "") && !ARITHMETIC.has(tokens[k - 1] ?? "");
        const line = plain ? conversion(field, op, number, negative) : null;
        if (line && !hint.conversions.includes(line)) hint.conversions.push(line);
      }
      // [-]number OP field, read as field OP' number
      const before = tokens[k - 1];
      const lead = tokens[k - 3];
      if (before && COMPARISONS.has(before) && isNumber(tokens[k - 2]) && (lead === undefined || lead === "(" || /^(and|or|not)$/i.test(lead))) {
        const line = conversion(field, MIRRORED[before]!, tokens[k - 2]!, false);
        if (line && !hint.conversions.includes(line)) hint.conversions.push(line);
      }
      return;
    }
    if (token.toLowerCase() === "kt" && tokens[k + 1] === "(" && isNumber(tokens[k + 2]) && tokens[k + 3] === ")") {
      const line = `kt(${tokens[k + 2]}) = ${formatNumber(Number(tokens[k + 2]) * METRES_PER_SECOND_PER_KNOT, 1)} m/s`;
      if (!knots.includes(line)) knots.push(line);
    }
  });
  return { fields: [...byKey.values()], knots };
}
