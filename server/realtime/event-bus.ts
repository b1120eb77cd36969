import { EventEmitter } from "node:events";

/** Everything the server announces to connected clients over Server-Sent Events. */
export interface BellwetherEvents {
  "ingest.progress": { jobId: number; state: string; progress: number; note: string | null };
  "ingest.finished": { jobId: number; state: "ready" | "failed"; reason: string | null; frameIds: number[] };
  "frame.ready": { frameId: number; runId: number; model: string; runTime: string; validTime: string };
}

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
