import { useQueryClient } from "@tanstack/react-query";
import type { ServerEvents } from "@shared/api/server-events.ts";
import { useServerEvents } from "@/hooks/use-server-events.ts";
import { triggerKeys } from "../api/trigger-keys.ts";

/**
 * Keeps the timeline, the active list and any open trigger page current from the server's live
 * events. `onOpened` hears each newly opened trigger (for the chime and the announcement).
 */
export function useTriggerLiveUpdates(onOpened?: (event: ServerEvents["trigger.changed"]) => void): void {
  const queryClient = useQueryClient();
  const refreshLists = () => {
    void queryClient.invalidateQueries({ queryKey: triggerKeys.timeline() });
    void queryClient.invalidateQueries({ queryKey: triggerKeys.active() });
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
    "ingest.finished": () => void queryClient.invalidateQueries({ queryKey: triggerKeys.timeline() }),
  });
}
