import { useEffect, useRef, useSyncExternalStore } from "react";
import { SERVER_EVENT_NAMES, type ServerEventName } from "@shared/api/server-events.ts";
import { serverEventHub, type ServerEventHandlers, type ServerEventStatus } from "@/lib/server-events.ts";

/**
 * Listens to the server's live events while the component is mounted, over the tab's one shared
 * connection. Handlers may change on every render; the latest ones are called.
 */
export function useServerEvents(handlers: ServerEventHandlers): void {
  const latest = useRef(handlers);
  useEffect(() => {
    latest.current = handlers;
  });

  useEffect(() => {
    const forward: ServerEventHandlers = { onOpen: () => latest.current.onOpen?.() };
    const route = forward as Record<ServerEventName, (payload: unknown) => void>;
    for (const name of SERVER_EVENT_NAMES) {
      route[name] = (payload) => (latest.current[name] as ((p: unknown) => void) | undefined)?.(payload);
    }
    return serverEventHub().subscribe(forward);
  }, []);
}

/** Whether live updates are flowing: "open" while connected. */
export function useServerEventStatus(): ServerEventStatus {
  return useSyncExternalStore(
    (onChange) => serverEventHub().onStatus(onChange),
    () => serverEventHub().status(),
    () => "idle",
  );
}
