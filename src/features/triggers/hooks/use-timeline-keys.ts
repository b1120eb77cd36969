import { useEffect, useRef } from "react";
import { CHORD_PREFIX, CHORD_WINDOW_MS, isTypingTarget } from "@/lib/key-chords.ts";
import { timelineKeyAction, type TimelineKeyAction } from "../timeline/timeline-selection.ts";

/**
 * The timeline's own keys (see timelineKeyAction). Quiet while typing, while a dialog is open, and
 * when something else already handled the key; Enter on a focused link or button keeps its own meaning.
 */
export function useTimelineKeys(onAction: (action: TimelineKeyAction) => void): void {
  const latest = useRef(onAction);
  useEffect(() => {
    latest.current = onAction;
  });
  useEffect(() => {
    // The second key of a "g" chord belongs to the navigation ("g a" is not an acknowledgement).
    let chordStartedAt = Number.NEGATIVE_INFINITY;
    const onKeyDown = (event: KeyboardEvent) => {
      if (event.defaultPrevented || event.repeat) return;
      const inChord = event.timeStamp - chordStartedAt <= CHORD_WINDOW_MS;
      chordStartedAt = event.key === CHORD_PREFIX && !inChord ? event.timeStamp : Number.NEGATIVE_INFINITY;
      if (inChord) return;
      const target = event.target instanceof HTMLElement ? event.target : null;
      if (isTypingTarget(target) || document.querySelector("dialog[open]")) return;
      const action = timelineKeyAction(event);
      if (!action) return;
      if (action.type === "open" && target?.closest("a, button, summary, [role='application']")) return;
      event.preventDefault();
      latest.current(action);
    };
    window.addEventListener("keydown", onKeyDown);
    return () => window.removeEventListener("keydown", onKeyDown);
  }, []);
}
