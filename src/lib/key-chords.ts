/**
 * Two-key navigation chords ("g" then a letter), kept free of the DOM so the timing and the
 * "not while typing" rule can be tested directly.
 */

/** How long after "g" the second key still counts. */
export const CHORD_WINDOW_MS = 1500;
export const CHORD_PREFIX = "g";

export interface ChordKey {
  key: string;
  /** Milliseconds, any monotonic clock. */
  at: number;
  ctrlKey?: boolean;
  metaKey?: boolean;
  altKey?: boolean;
}

export interface ChordBinding {
  shortcut: string;
  path: string;
}

/**
 * Returns a function that takes each key press and answers with the path to visit once a chord
 * completes, or null. A modified key (Ctrl, Cmd, Alt) always breaks the chord.
 */
export function createChordMatcher(bindings: readonly ChordBinding[], windowMs = CHORD_WINDOW_MS) {
  let prefixAt: number | null = null;
  return (press: ChordKey): string | null => {
    if (press.ctrlKey || press.metaKey || press.altKey) {
      prefixAt = null;
      return null;
    }
    const key = press.key.toLowerCase();
    if (prefixAt !== null && press.at - prefixAt <= windowMs) {
      prefixAt = null;
      const binding = bindings.find((b) => b.shortcut.toLowerCase() === key);
      if (binding) return binding.path;
      // "g g" restarts the chord rather than being lost.
      if (key === CHORD_PREFIX) prefixAt = press.at;
      return null;
    }
    prefixAt = key === CHORD_PREFIX ? press.at : null;
    return null;
  };
}

/** What the focused element looks like, enough to tell whether the user is typing. */
export interface FocusTarget {
  tagName?: string;
  isContentEditable?: boolean;
  type?: string;
}

const NON_TEXT_INPUT_TYPES = new Set(["button", "checkbox", "radio", "submit", "reset", "range", "color", "file", "image"]);

/** True while the user is typing somewhere, when shortcuts must stay quiet. */
export function isTypingTarget(target: FocusTarget | null | undefined): boolean {
  if (!target) return false;
  if (target.isContentEditable) return true;
  const tag = (target.tagName ?? "").toUpperCase();
  if (tag === "TEXTAREA" || tag === "SELECT") return true;
  if (tag === "INPUT") return !NON_TEXT_INPUT_TYPES.has((target.type ?? "text").toLowerCase());
  return false;
}
