import { EventEmitter } from "node:events";
import type { ServerEvents } from "../../shared/api/server-events.ts";

/** Everything the server announces to connected clients over Server-Sent Events (schemas in shared/api). */
export type BellwetherEvents = ServerEvents;

export type EventName = keyof BellwetherEvents;

/** A small typed wrapper over EventEmitter; one per running app. */
export class EventBus {
  private readonly emitter = new EventEmitter();

  constructor() {
    // Every open browser tab is one listener.
    this.emitter.setMaxListeners(0);
  }

  emit<K extends EventName>(name: K, payload: BellwetherEvents[K]): void {
    this.emitter.emit("event", name, payload);
  }

  /** Listens to every event; returns the function that stops listening. */
  onAny(listener: <K extends EventName>(name: K, payload: BellwetherEvents[K]) => void): () => void {
    this.emitter.on("event", listener);
    return () => this.emitter.off("event", listener);
  }
}
