import { useEffect, useState } from "react";

/**
 * `value`, once it has stopped changing for `delayMs`: for work that should follow typing without
 * running on every keystroke (a server preview). Compared by JSON, so a fresh but equal object does
 * not restart the wait.
 */
export function useDebouncedValue<T>(value: T, delayMs: number): T {
  const [settled, setSettled] = useState(value);
  const key = JSON.stringify(value);
  useEffect(() => {
    const timer = window.setTimeout(() => setSettled(value), delayMs);
    return () => window.clearTimeout(timer);
    // The key stands for the value: an equal value must not restart the timer.
  }, [key, delayMs]);
  return settled;
}
