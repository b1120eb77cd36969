import { useMemo } from "react";
import { useQueryClient } from "@tanstack/react-query";
import type { ServerEvents } from "@shared/api/server-events.ts";
import { useServerEvents } from "@/hooks/use-server-events.ts";
import { createRefreshGate } from "@/lib/refresh-gate.ts";
import { triggerKeys } from "../api/trigger-keys.ts";

/**
 * Keeps the timeline, the active list and any open trigger page current from the server's live
 * events. `onOpened` hears each newly opened trigger (for the chime and the notice). Bursts of
 * events (a frame opening several triggers, each notified twice) refresh each list once, plus
 * once more if something changed meanwhile.
 */
export function useTriggerLiveUpdates(onOpened?: (event: ServerEvents["trigger.changed"]) => void): void {
  const queryClient = useQueryClient();
  const gates = useMemo(() => {
    // cancelRefetch: false lets a running fetch finish; the gate asks again afterwards if needed.
    const gate = (queryKey: readonly unknown[]) => createRefreshGate(() => queryClient.invalidateQueries({ queryKey }, { cancelRefetch: false }));
    return { timeline: gate(triggerKeys.timeline()), active: gate(triggerKeys.active()) };
  }, [queryClient]);
  const refreshLists = () => {
    gates.timeline.request();
    gates.active.request();
  };
  useServerEvents({
    // Events may have been missed while the stream was down.
    onOpen: () => {
      refreshLists();
      void queryClient.invalidateQueries({ queryKey: triggerKeys.details() });
    },
    "trigger.changed": (event) => {
      refreshLists();
      void queryClient.invalidateQueries({ queryKey: triggerKeys.detail(event.triggerId) });
      if (event.kind === "opened") onOpened?.(event);
    },
    // A grid that finished (or failed) is a light entry of its own on the timeline.
    "ingest.finished": () => gates.timeline.request(),
  });
}
