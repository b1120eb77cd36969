import { useEffect, useRef } from "react";
import { isTypingTarget } from "@/lib/key-chords.ts";

/** The key that cycles the shaded parcel. */
export const PARCEL_SHORTCUT = "p";

/**
 * Calls `onCycle` when "p" is pressed on the page. Quiet while the user types in a field, while a dialog is
 * open, with a modifier held, or when another handler (the "g" chords) already used the key.
 */
export function useParcelShortcut(onCycle: () => void): void {
  const latest = useRef(onCycle);
  useEffect(() => {
    latest.current = onCycle;
  });
  useEffect(() => {
    const onKeyDown = (event: KeyboardEvent) => {
      if (event.defaultPrevented || event.repeat || event.ctrlKey || event.metaKey || event.altKey) return;
      if (event.key.toLowerCase() !== PARCEL_SHORTCUT) return;
      const target = event.target instanceof HTMLElement ? event.target : null;
      if (isTypingTarget(target) || document.querySelector("dialog[open]")) return;
      event.preventDefault();
      latest.current();
    };
    window.addEventListener("keydown", onKeyDown);
    return () => window.removeEventListener("keydown", onKeyDown);
  }, []);
}
