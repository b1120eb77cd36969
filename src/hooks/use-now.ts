import { useEffect, useState } from "react";

/** The current time, refreshed on each whole second (aligned so the clock never skips a second). */
export function useNow(intervalMs = 1000): Date {
  const [now, setNow] = useState(() => new Date());
  useEffect(() => {
    let timer: number;
    const schedule = () => {
      const delay = intervalMs - (Date.now() % intervalMs) + 5;
      timer = window.setTimeout(() => {
        setNow(new Date());
        schedule();
      }, delay);
    };
    schedule();
    return () => window.clearTimeout(timer);
  }, [intervalMs]);
  return now;
}
