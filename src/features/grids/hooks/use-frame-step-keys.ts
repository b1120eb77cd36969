import { useEffect, useRef } from "react";
import { isTypingTarget } from "@/lib/key-chords.ts";

/** Which way a key steps through valid times, if at all. */
export function frameStepForKey(key: string): -1 | 1 | 0 {
  if (key === "[" || key === "ArrowLeft") return -1;
  if (key === "]" || key === "ArrowRight") return 1;
  return 0;
}

/**
 * `[` / `]` and ← / → step to the previous or next valid time. Quiet while typing, while a dialog
 * is open, and when something else already used the key (the focused map moves its cursor with arrows).
 */
export function useFrameStepKeys(onStep: (direction: -1 | 1) => void): void {
  const latest = useRef(onStep);
  useEffect(() => {
    latest.current = onStep;
  });
  useEffect(() => {
    const onKeyDown = (event: KeyboardEvent) => {
      if (event.defaultPrevented || event.ctrlKey || event.metaKey || event.altKey || event.shiftKey) return;
      const target = event.target instanceof HTMLElement ? event.target : null;
      if (isTypingTarget(target) || document.querySelector("dialog[open]")) return;
      const direction = frameStepForKey(event.key);
      if (direction === 0) return;
      event.preventDefault();
      latest.current(direction);
    };
    window.addEventListener("keydown", onKeyDown);
    return () => window.removeEventListener("keydown", onKeyDown);
  }, []);
}
