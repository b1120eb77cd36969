import { useEffect, useRef } from "react";
import { useToast } from "@/components/ui/toaster.tsx";
import { useActiveTriggers } from "../api/get-active-triggers.ts";
import { useAlertPreferences } from "../hooks/use-alert-preferences.ts";
import { useTitleBadge } from "../hooks/use-title-badge.ts";
import { useTriggerLiveUpdates } from "../hooks/use-trigger-live-updates.ts";
import { playNewTriggerChime, unlockAlertSound } from "../timeline/alert-sound.ts";
import { openedNotice } from "../timeline/opened-notice.ts";

const BASE_TITLE = "Bellwether";
/** Triggers opened within this many milliseconds of each other share one chime and one notice. */
const BURST_MS = 400;

/**
 * Runs on every signed-in page so a new trigger is never missed: keeps trigger data current from
 * the live stream, chimes (when the sound is on), shows a short notice (announced to screen
 * readers), and keeps the count of open triggers in the tab's title (when the badge is on).
 */
export function TriggerAlerts() {
  const preferences = useAlertPreferences();
  const toast = useToast();
  const active = useActiveTriggers();
  const openCount = active.data?.filter((trigger) => trigger.state === "open").length ?? 0;
  useTitleBadge(BASE_TITLE, openCount, preferences.titleBadge);

  // Browsers allow sound only after the person has clicked or typed on the page.
  useEffect(() => {
    const unlock = () => unlockAlertSound();
    window.addEventListener("pointerdown", unlock);
    window.addEventListener("keydown", unlock);
    return () => {
      window.removeEventListener("pointerdown", unlock);
      window.removeEventListener("keydown", unlock);
    };
  }, []);

  // A frame often opens several triggers at once: gather them, then chime once and show one notice.
  const burst = useRef<{ severities: string[]; timer: number | null }>({ severities: [], timer: null });
  useEffect(() => () => window.clearTimeout(burst.current.timer ?? undefined), []);
  useTriggerLiveUpdates((event) => {
    burst.current.severities.push(event.severity);
    if (burst.current.timer !== null) return;
    burst.current.timer = window.setTimeout(() => {
      const severities = burst.current.severities;
      burst.current = { severities: [], timer: null };
      if (preferences.sound) playNewTriggerChime();
      // The notice sits in the toaster's polite live region, so screen readers announce it too.
      toast.info(openedNotice(severities), "At the top of the timeline.");
    }, BURST_MS);
  });

  return null;
}
