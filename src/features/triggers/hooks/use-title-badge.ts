import { useEffect } from "react";
import { titleWithBadge } from "../timeline/alert-preferences.ts";

/** Puts the count of open triggers in front of the tab's title while mounted ("(3) Timeline · Bellwether"). */
export function useTitleBadge(baseTitle: string, openCount: number, on: boolean): void {
  useEffect(() => {
    const previous = document.title;
    document.title = titleWithBadge(baseTitle, openCount, on);
    return () => {
      document.title = previous;
    };
  }, [baseTitle, openCount, on]);
}
