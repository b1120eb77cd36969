import { useEffect, useRef } from "react";
import { createChordMatcher, isTypingTarget, type ChordBinding } from "@/lib/key-chords.ts";

/**
 * Listens for "g" + letter chords and for "?" (help). Quiet while the user types in a field or
 * while a dialog is open, so shortcuts never steal a keystroke.
 */
export function useKeyChords({
  bindings,
  onNavigate,
  onHelp,
}: {
  bindings: readonly ChordBinding[];
  onNavigate: (path: string) => void;
  onHelp: () => void;
}): void {
  // The latest callbacks, read at key time, so the listener is not re-attached on every render.
  const handlers = useRef({ onNavigate, onHelp });
  useEffect(() => {
    handlers.current = { onNavigate, onHelp };
  });

  useEffect(() => {
    const match = createChordMatcher(bindings);
    const onKeyDown = (event: KeyboardEvent) => {
      if (event.defaultPrevented || event.repeat) return;
      const target = event.target instanceof HTMLElement ? event.target : null;
      if (isTypingTarget(target) || document.querySelector("dialog[open]")) return;
      if (event.key === "?" && !event.ctrlKey && !event.metaKey && !event.altKey) {
        event.preventDefault();
        handlers.current.onHelp();
        return;
      }
      const path = match({ key: event.key, at: event.timeStamp, ctrlKey: event.ctrlKey, metaKey: event.metaKey, altKey: event.altKey });
      if (path) {
        event.preventDefault();
        handlers.current.onNavigate(path);
      }
    };
    window.addEventListener("keydown", onKeyDown);
    return () => window.removeEventListener("keydown", onKeyDown);
  }, [bindings]);
}
