/**
 * Keyboard selection on the timeline, kept apart from the DOM. The selection is held as a row key,
 * not an index, so a new trigger arriving on top does not move it to another row.
 */

/**
 * The key selected after one step (`1` down, `-1` up) through the rows that can be selected
 * (`null` marks a row that cannot: a day heading, a grid arrival). With nothing selected, or
 * a selection that has left the list, either direction starts at the first selectable row. At
 * either end the selection stays put.
 */
export function stepSelection(keys: readonly (string | null)[], current: string | null, step: 1 | -1): string | null {
  const from = current === null ? -1 : keys.indexOf(current);
  if (from < 0) return keys.find((key) => key !== null) ?? null;
  for (let index = from + step; index >= 0 && index < keys.length; index += step) {
    if (keys[index] !== null) return keys[index]!;
  }
  return current;
}

export type TimelineKeyAction =
  | { type: "move"; step: 1 | -1 }
  | { type: "acknowledge"; withNote: boolean }
  | { type: "open" }
  | { type: "handover" };

export interface KeyPress {
  key: string;
  ctrlKey?: boolean;
  metaKey?: boolean;
  altKey?: boolean;
}

/**
 * What a key does on the timeline: j / k move down / up (as in many mail readers), a acknowledges
 * the selected open trigger with a note dialog, Shift+A at once without a note, Enter opens it,
 * h lists what is open for the next shift. Arrows keep scrolling the page, and keys with Ctrl, Cmd or
 * Alt are left to the browser.
 */
export function timelineKeyAction(press: KeyPress): TimelineKeyAction | null {
  if (press.ctrlKey || press.metaKey || press.altKey) return null;
  switch (press.key) {
    case "j":
      return { type: "move", step: 1 };
    case "k":
      return { type: "move", step: -1 };
    case "a":
      return { type: "acknowledge", withNote: true };
    case "A":
      return { type: "acknowledge", withNote: false };
    case "Enter":
      return { type: "open" };
    case "h":
      return { type: "handover" };
    default:
      return null;
  }
}

/** The timeline's keys as the help dialog lists them. */
export const TIMELINE_SHORTCUTS: ReadonlyArray<{ label: string; keys: readonly string[] }> = [
  { label: "Timeline: next / previous trigger", keys: ["j", "k"] },
  { label: "Timeline: acknowledge the selected trigger (with a note)", keys: ["a"] },
  { label: "Timeline: acknowledge at once, no note", keys: ["Shift", "A"] },
  { label: "Timeline: open the selected trigger", keys: ["Enter"] },
  { label: "Timeline: handover list for the next shift", keys: ["h"] },
];
