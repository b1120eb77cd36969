/**
 * Seeded random rule texts and frames for comparing the compiled evaluator with the per-point reference.
 * Frames mix smooth values, exact copies of the constants the rules use (so == and boundaries are hit),
 * zeros, negatives and NaN (missing data).
 */
import type { FieldKey } from "../../../shared/fields.ts";
import { seededRandom } from "../../reference/helpers/seeded-random.ts";

export type Random = () => number;
export { seededRandom };

const NUMBER_FIELDS = ["mlcape", "shear_0_6km", "mlcin", "srh_0_1km", "lapse_700_500"] as const;
const FLAG_FIELDS = ["eff_present", "jet_exit"] as const;
const CONSTANTS = ["0", "1", "2", "5", "10", "0.5", "1000", "1e-5"] as const;
const QUADRANT_VALUES = ["0", "1", "3", "4", "left_exit", "core", "right_entrance"] as const;
export const RANDOM_RULE_FIELDS: readonly FieldKey[] = [...NUMBER_FIELDS, ...FLAG_FIELDS, "jet_quadrant"];

export function randomCondition(r: Random, depth: number): string {
  const choice = depth <= 0 ? Math.floor(r() * 4) : Math.floor(r() * 9);
  switch (choice) {
    case 0:
      return pick(r, FLAG_FIELDS);
    case 1:
      return `${randomNumber(r, depth - 1)} ${pick(r, ["<", "<=", ">", ">=", "==", "!="])} ${randomNumber(r, depth - 1)}`;
    case 2:
      return `jet_quadrant ${pick(r, ["==", "!="])} ${pick(r, QUADRANT_VALUES)}`;
    case 3:
      return `${pick(r, FLAG_FIELDS)} ${pick(r, ["==", "!="])} ${pick(r, ["0", "1", ...FLAG_FIELDS])}`;
    case 4:
      return `oneof(jet_quadrant, ${pick(r, QUADRANT_VALUES)}, ${pick(r, QUADRANT_VALUES)})`;
    case 5:
      return `not (${randomCondition(r, depth - 1)})`;
    case 6:
    case 7:
      return `(${randomCondition(r, depth - 1)}) and (${randomCondition(r, depth - 1)})`;
    default:
      return `(${randomCondition(r, depth - 1)}) or (${randomCondition(r, depth - 1)})`;
  }
}

function randomNumber(r: Random, depth: number): string {
  const choice = depth <= 0 ? Math.floor(r() * 2) : Math.floor(r() * 9);
  switch (choice) {
    case 0:
      return pick(r, NUMBER_FIELDS);
    case 1:
      return pick(r, CONSTANTS);
    case 2:
      return `-${pick(r, NUMBER_FIELDS)}`;
    case 3:
      return `(${randomNumber(r, depth - 1)} ${pick(r, ["+", "-", "*"])} ${randomNumber(r, depth - 1)})`;
    case 4:
      return `(${randomNumber(r, depth - 1)} / ${pick(r, [...NUMBER_FIELDS, "2", "0.5"])})`;
    case 5:
      return `${pick(r, ["abs", "sqrt"])}(${randomNumber(r, depth - 1)})`;
    case 6:
      return `${pick(r, ["min", "max"])}(${randomNumber(r, depth - 1)}, ${randomNumber(r, depth - 1)}, ${pick(r, NUMBER_FIELDS)})`;
    case 7:
      return `hypot(${pick(r, NUMBER_FIELDS)}, ${randomNumber(r, depth - 1)})`;
    default:
      return r() < 0.5 ? `kt(${pick(r, CONSTANTS)})` : `${pick(r, NUMBER_FIELDS)} ^ 2`;
  }
}

/** A frame of n points for the fields random rules read. */
export function randomFrame(r: Random, n: number, nanShare: number): Map<FieldKey, Float32Array> {
  const frame = new Map<FieldKey, Float32Array>();
  for (const key of NUMBER_FIELDS) {
    frame.set(key, fill(n, r, nanShare, () => (r() < 0.3 ? Number(pick(r, CONSTANTS)) : (r() - 0.3) * 40)));
  }
  for (const key of FLAG_FIELDS) frame.set(key, fill(n, r, nanShare, () => (r() < 0.5 ? 0 : 1)));
  frame.set("jet_quadrant", fill(n, r, nanShare, () => Math.floor(r() * 6)));
  return frame;
}

function fill(n: number, r: Random, nanShare: number, value: () => number): Float32Array {
  const data = new Float32Array(n);
  // Runs of equal "missing or not" state, as missing data comes in patches, plus scattered single gaps.
  let missing = false;
  for (let i = 0; i < n; i++) {
    if (r() < 0.01) missing = r() < nanShare;
    data[i] = missing || r() < nanShare / 4 ? Number.NaN : value();
  }
  return data;
}

export function pick<T>(r: Random, options: readonly T[]): T {
  return options[Math.floor(r() * options.length)];
}
