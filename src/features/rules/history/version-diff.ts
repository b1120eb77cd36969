/**
 * The difference between two saved versions of a rule, field by field, with the expression compared
 * word by word (longest common subsequence of its words and operators), so a changed threshold shows
 * as one struck-out number and one new one rather than two whole lines.
 */
import type { RuleDefinition } from "@shared/api/rules.ts";
import {
  describeCoolDown,
  describePersistence,
  describeRecipients,
  describeSeverity,
  describeSpatialCondition,
  describeValidTimeWindow,
} from "../rule-descriptions.ts";

export type WordDiffKind = "same" | "removed" | "added";

export interface WordDiffPart {
  kind: WordDiffKind;
  /** The words of this part, joined by single spaces. */
  text: string;
}

export interface DefinitionChange {
  key: keyof RuleDefinition;
  label: string;
  before: string;
  after: string;
  /** The expression only: the word-level difference. */
  words?: WordDiffPart[];
  /** Zones only: what was added and removed, as labels. */
  added?: string[];
  removed?: string[];
}

const WORD = /[A-Za-z_][A-Za-z0-9_]*|\d+(?:\.\d*)?(?:[eE][+-]?\d+)?|\.\d+|<=|>=|==|!=|&&|\|\||\S/g;
/** Above this many table cells the comparison gives up on alignment and shows old and new whole. */
const MAX_TABLE_CELLS = 4_000_000;

export function expressionWords(text: string): string[] {
  return text.match(WORD) ?? [];
}

/** Word-level difference of two expressions; spacing differences alone are no change. */
export function wordDiff(before: string, after: string): WordDiffPart[] {
  const a = expressionWords(before);
  const b = expressionWords(after);
  const raw: Array<{ kind: WordDiffKind; word: string }> = [];
  if (a.length * b.length > MAX_TABLE_CELLS) {
    for (const word of a) raw.push({ kind: "removed", word });
    for (const word of b) raw.push({ kind: "added", word });
    return mergeParts(raw);
  }
  // lcs[i][j] = length of the longest common subsequence of a[i..] and b[j..], in one flat array.
  const width = b.length + 1;
  const lcs = new Uint32Array((a.length + 1) * width);
  for (let i = a.length - 1; i >= 0; i--) {
    for (let j = b.length - 1; j >= 0; j--) {
      lcs[i * width + j] = a[i] === b[j] ? lcs[(i + 1) * width + j + 1]! + 1 : Math.max(lcs[(i + 1) * width + j]!, lcs[i * width + j + 1]!);
    }
  }
  let i = 0;
  let j = 0;
  while (i < a.length && j < b.length) {
    if (a[i] === b[j]) {
      raw.push({ kind: "same", word: a[i]! });
      i++;
      j++;
    } else if (lcs[(i + 1) * width + j]! >= lcs[i * width + j + 1]!) {
      raw.push({ kind: "removed", word: a[i++]! });
    } else {
      raw.push({ kind: "added", word: b[j++]! });
    }
  }
  while (i < a.length) raw.push({ kind: "removed", word: a[i++]! });
  while (j < b.length) raw.push({ kind: "added", word: b[j++]! });
  return mergeParts(raw);
}

function mergeParts(raw: ReadonlyArray<{ kind: WordDiffKind; word: string }>): WordDiffPart[] {
  const parts: WordDiffPart[] = [];
  for (const { kind, word } of raw) {
    const last = parts[parts.length - 1];
    if (last && last.kind === kind) last.text += ` ${word}`;
    else parts.push({ kind, text: word });
  }
  return parts;
}

type Describer = (definition: RuleDefinition) => string;

/**
 * Every part of a definition that differs between `before` and `after`, in the editor's order.
 * `zoneLabel` names a zone id ("CWB Cottonwood Breaks"); `recipientNames` names contacts and groups.
 */
export function diffDefinitions(
  before: RuleDefinition,
  after: RuleDefinition,
  zoneLabel: (id: number) => string,
  recipientNames: Parameters<typeof describeRecipients>[1] = {},
): DefinitionChange[] {
  const changes: DefinitionChange[] = [];
  const simple = (key: keyof RuleDefinition, label: string, describe: Describer) => {
    const was = describe(before);
    const now = describe(after);
    if (was !== now) changes.push({ key, label, before: was, after: now });
  };
  simple("name", "Name", (d) => d.name);
  simple("description", "Description", (d) => d.description || "(none)");
  if (before.expression !== after.expression) {
    changes.push({ key: "expression", label: "Expression", before: before.expression, after: after.expression, words: wordDiff(before.expression, after.expression) });
  }
  const zonesBefore = new Set(before.zoneIds);
  const zonesAfter = new Set(after.zoneIds);
  const added = after.zoneIds.filter((id) => !zonesBefore.has(id));
  const removed = before.zoneIds.filter((id) => !zonesAfter.has(id));
  if (added.length || removed.length) {
    const list = (ids: readonly number[]) => ids.map(zoneLabel).join(", ");
    changes.push({ key: "zoneIds", label: "Zones", before: list(before.zoneIds), after: list(after.zoneIds), added: added.map(zoneLabel), removed: removed.map(zoneLabel) });
  }
  simple("severity", "Severity", (d) => describeSeverity(d.severity));
  simple("spatialCondition", "Spatial condition", (d) => describeSpatialCondition(d.spatialCondition));
  simple("validTimeWindow", "Valid times", (d) => describeValidTimeWindow(d.validTimeWindow));
  simple("persistenceFrames", "Persistence", (d) => describePersistence(d.persistenceFrames));
  simple("coolDownHours", "Cool-down", (d) => describeCoolDown(d.coolDownHours));
  simple("recipients", "Recipients", (d) => describeRecipients(d.recipients, recipientNames));
  simple("enabled", "Switched", (d) => (d.enabled ? "on" : "off"));
  return changes;
}
