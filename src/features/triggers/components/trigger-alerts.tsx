import { useEffect } from "react";
import { severityLevel, SEVERITY_KEYS, type Severity } from "@shared/rules/severity.ts";
import { useToast } from "@/components/ui/toaster.tsx";
import { useActiveTriggers } from "../api/get-active-triggers.ts";
import { useAlertPreferences } from "../hooks/use-alert-preferences.ts";
import { useTitleBadge } from "../hooks/use-title-badge.ts";
import { useTriggerLiveUpdates } from "../hooks/use-trigger-live-updates.ts";
import { playNewTriggerChime, unlockAlertSound } from "../timeline/alert-sound.ts";

const BASE_TITLE = "Bellwether";

const isSeverity = (value: string): value is Severity => (SEVERITY_KEYS as readonly string[]).includes(value);

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

  useTriggerLiveUpdates((event) => {
    const label = isSeverity(event.severity) ? severityLevel(event.severity).label : event.severity;
    if (preferences.sound) playNewTriggerChime();
    // The notice sits in the toaster's polite live region, so screen readers announce it too.
    toast.info(`New ${label} trigger opened`, "It is at the top of the timeline.");
  });

  return null;
}
