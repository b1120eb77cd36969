/**
 * Bellwether's own three-step severity scale for rules and the triggers they open. The names say how
 * soon a forecaster should look, not what the weather will be: official warning categories belong to the
 * national service, and these deliberately borrow neither their names nor their colour sequence.
 *
 * Colours are calm, cool-to-warm tones (blue, violet, berry) that stay readable with white text:
 * each has a contrast ratio of at least 4.5:1 against white (checked in the tests), so the label is
 * legible for normal-size text and never relies on hue alone; the label is always shown beside it.
 */

export const SEVERITY_KEYS = ["heads-up", "serious", "urgent"] as const;
export type Severity = (typeof SEVERITY_KEYS)[number];

export interface SeverityLevel {
  readonly key: Severity;
  readonly label: string;
  /** 1 (lowest) to 3; a rise in rank lets a trigger through a cool-down. */
  readonly rank: 1 | 2 | 3;
  readonly meaning: string;
  /** Badge background (sRGB hex). */
  readonly colour: string;
  /** Text on the badge. */
  readonly textColour: string;
}

export const SEVERITY_LEVELS: readonly SeverityLevel[] = [
  {
    key: "heads-up",
    label: "Heads-up",
    rank: 1,
    meaning: "Ingredients are coming together; worth a look during the shift.",
    colour: "#4A6F94",
    textColour: "#FFFFFF",
  },
  {
    key: "serious",
    label: "Serious",
    rank: 2,
    meaning: "A strong signal; look now and consider the office's next steps.",
    colour: "#6E5394",
    textColour: "#FFFFFF",
  },
  {
    key: "urgent",
    label: "Urgent",
    rank: 3,
    meaning: "A high-end signal; needs a forecaster's decision straight away.",
    colour: "#8F3A62",
    textColour: "#FFFFFF",
  },
];

const BY_KEY = new Map<Severity, SeverityLevel>(SEVERITY_LEVELS.map((s) => [s.key, s]));

export function severityLevel(key: Severity): SeverityLevel {
  const level = BY_KEY.get(key);
  if (!level) throw new RangeError(`Unknown severity "${String(key)}"; expected one of ${SEVERITY_KEYS.join(", ")}.`);
  return level;
}

/** Negative when a is lower than b, 0 when equal, positive when higher (for sorting). */
export function compareSeverity(a: Severity, b: Severity): number {
  return severityLevel(a).rank - severityLevel(b).rank;
}

/** True when `next` is more severe than `previous`: the one case a cool-down lets a new trigger through. */
export function isSeverityRise(previous: Severity, next: Severity): boolean {
  return compareSeverity(next, previous) > 0;
}
