import { SERVER_EVENT_NAMES, serverEventSchemas, type ServerEventName, type ServerEvents } from "@shared/api/server-events.ts";

/**
 * One Server-Sent Events connection per browser tab, shared by every screen that listens. The
 * connection opens with the first subscriber and closes with the last. The browser reconnects by
 * itself after a dropped stream; when the server refuses the stream outright (a 401 after the
 * session ended, a restart) the hub tries again after a pause. Every message is checked against
 * its schema, and a malformed one is dropped rather than passed on.
 */

export const SERVER_EVENTS_PATH = "/api/events";

export type ServerEventHandlers = { [K in ServerEventName]?: (payload: ServerEvents[K]) => void } & {
  /** Each time the stream (re)opens: events may have been missed, so refetch what matters. */
  onOpen?: () => void;
};

export type ServerEventStatus = "idle" | "connecting" | "open" | "retrying";

/** The part of the browser's EventSource the hub uses, so tests can stand in for it. */
export interface EventSourceLike {
  readonly readyState: number;
  onopen: ((event: Event) => void) | null;
  onerror: ((event: Event) => void) | null;
  addEventListener(type: string, listener: (event: MessageEvent) => void): void;
  close(): void;
}

/** EventSource.CLOSED: the browser gave up and will not reconnect by itself. */
const CLOSED = 2;

export interface ServerEventHubOptions {
  url?: string;
  createSource?: (url: string) => EventSourceLike;
  /** Pause before trying again after the server refused the stream. */
  retryMs?: number;
  setTimer?: (callback: () => void, ms: number) => unknown;
  clearTimer?: (timer: unknown) => void;
  onMalformed?: (name: string, data: unknown) => void;
}

export function createServerEventHub(options: ServerEventHubOptions = {}) {
  const url = options.url ?? SERVER_EVENTS_PATH;
  const createSource = options.createSource ?? ((target: string) => new EventSource(target) as EventSourceLike);
  const retryMs = options.retryMs ?? 5000;
  const setTimer = options.setTimer ?? ((callback: () => void, ms: number) => setTimeout(callback, ms));
  const clearTimer = options.clearTimer ?? ((timer: unknown) => clearTimeout(timer as ReturnType<typeof setTimeout>));
  const onMalformed = options.onMalformed ?? ((name: string) => console.warn(`Dropped a malformed "${name}" event from the server`));

  const subscribers = new Set<ServerEventHandlers>();
  const statusListeners = new Set<(status: ServerEventStatus) => void>();
  let source: EventSourceLike | null = null;
  let retryTimer: unknown = null;
  let status: ServerEventStatus = "idle";

  function setStatus(next: ServerEventStatus) {
    if (next === status) return;
    status = next;
    for (const listener of statusListeners) listener(next);
  }

  function dispatch<K extends ServerEventName>(name: K, event: MessageEvent) {
    let data: unknown;
    try {
      data = JSON.parse(String(event.data));
    } catch {
      onMalformed(name, event.data);
      return;
    }
    const parsed = serverEventSchemas[name].safeParse(data);
    if (!parsed.success) {
      onMalformed(name, data);
      return;
    }
    const payload = parsed.data as ServerEvents[K];
    for (const handlers of [...subscribers]) (handlers[name] as ((p: ServerEvents[K]) => void) | undefined)?.(payload);
  }

  function open() {
    setStatus("connecting");
    const current = createSource(url);
    source = current;
    current.onopen = () => {
      setStatus("open");
      for (const handlers of [...subscribers]) handlers.onOpen?.();
    };
    current.onerror = () => {
      if (source !== current) return;
      if (current.readyState !== CLOSED) {
        setStatus("connecting");
        return;
      }
      current.close();
      source = null;
      setStatus("retrying");
      retryTimer = setTimer(() => {
        retryTimer = null;
        if (subscribers.size > 0) open();
      }, retryMs);
    };
    for (const name of SERVER_EVENT_NAMES) current.addEventListener(name, (event) => dispatch(name, event));
  }

  function shut() {
    if (retryTimer !== null) clearTimer(retryTimer);
    retryTimer = null;
    source?.close();
    source = null;
    setStatus("idle");
  }

  return {
    /** Starts listening; returns the function that stops. */
    subscribe(handlers: ServerEventHandlers): () => void {
      subscribers.add(handlers);
      if (!source && retryTimer === null) open();
      return () => {
        subscribers.delete(handlers);
        if (subscribers.size === 0) shut();
      };
    },
    status: () => status,
    onStatus(listener: (status: ServerEventStatus) => void): () => void {
      statusListeners.add(listener);
      return () => statusListeners.delete(listener);
    },
  };
}

export type ServerEventHub = ReturnType<typeof createServerEventHub>;

let appHub: ServerEventHub | null = null;

/** The tab's one hub, made on first use (never during server-side or test imports). */
export function serverEventHub(): ServerEventHub {
  appHub ??= createServerEventHub();
  return appHub;
}
