import { describe, expect, it } from "vitest";
import { createServerEventHub, type EventSourceLike } from "../../../src/lib/server-events.ts";

/** A stand-in for the browser's EventSource that the test drives by hand. */
class FakeSource implements EventSourceLike {
  readyState = 0;
  onopen: ((event: Event) => void) | null = null;
  onerror: ((event: Event) => void) | null = null;
  closed = false;
  private readonly listeners = new Map<string, Array<(event: MessageEvent) => void>>();
  constructor(readonly url: string) {}
  addEventListener(type: string, listener: (event: MessageEvent) => void) {
    this.listeners.set(type, [...(this.listeners.get(type) ?? []), listener]);
  }
  close() {
    this.closed = true;
    this.readyState = 2;
  }
  open() {
    this.readyState = 1;
    this.onopen?.(new Event("open"));
  }
  send(type: string, data: unknown) {
    for (const listener of this.listeners.get(type) ?? []) listener(new MessageEvent(type, { data: typeof data === "string" ? data : JSON.stringify(data) }));
  }
  fail(closed: boolean) {
    this.readyState = closed ? 2 : 0;
    this.onerror?.(new Event("error"));
  }
}

function setup() {
  const sources: FakeSource[] = [];
  const timers: Array<() => void> = [];
  const malformed: string[] = [];
  const hub = createServerEventHub({
    createSource: (url) => {
      const source = new FakeSource(url);
      sources.push(source);
      return source;
    },
    setTimer: (callback) => timers.push(callback),
    clearTimer: () => timers.splice(0),
    onMalformed: (name) => malformed.push(name),
  });
  return { hub, sources, timers, malformed };
}

const progress = { jobId: 4, state: "diagnosing", progress: 0.42, note: "Diagnosing frame 1 of 2" };

describe("the shared server-event connection", () => {
  it("opens one stream for all listeners and closes it with the last", () => {
    const { hub, sources } = setup();
    const stopA = hub.subscribe({});
    const stopB = hub.subscribe({});
    expect(sources).toHaveLength(1);
    expect(sources[0]!.url).toBe("/api/events");
    stopA();
    expect(sources[0]!.closed).toBe(false);
    stopB();
    expect(sources[0]!.closed).toBe(true);
    expect(hub.status()).toBe("idle");
  });

  it("passes each checked event to every listener of that name, and reports each (re)opening", () => {
    const { hub, sources } = setup();
    const seen: unknown[] = [];
    let opened = 0;
    hub.subscribe({ "ingest.progress": (event) => seen.push(event), onOpen: () => opened++ });
    hub.subscribe({ "frame.ready": (event) => seen.push(event) });
    sources[0]!.open();
    expect(hub.status()).toBe("open");
    sources[0]!.send("ingest.progress", progress);
    sources[0]!.send("frame.ready", { frameId: 9, runId: 2, model: "m", runTime: "2026-05-14T12:00:00Z", validTime: "2026-05-14T13:00:00Z" });
    expect(seen).toEqual([progress, expect.objectContaining({ frameId: 9 })]);
    expect(opened).toBe(1);
  });

  it("drops messages that are not JSON or do not match their schema", () => {
    const { hub, sources, malformed } = setup();
    const seen: unknown[] = [];
    hub.subscribe({ "ingest.progress": (event) => seen.push(event) });
    sources[0]!.send("ingest.progress", "{not json");
    sources[0]!.send("ingest.progress", { ...progress, state: "exploded" });
    expect(seen).toEqual([]);
    expect(malformed).toEqual(["ingest.progress", "ingest.progress"]);
  });

  it("lets the browser reconnect a dropped stream, and starts a new one after a refusal", () => {
    const { hub, sources, timers } = setup();
    let opened = 0;
    hub.subscribe({ onOpen: () => opened++ });
    sources[0]!.open();
    sources[0]!.fail(false); // a drop: the browser retries by itself
    expect(hub.status()).toBe("connecting");
    expect(sources).toHaveLength(1);
    sources[0]!.fail(true); // refused (e.g. 401 after the session ended): the hub waits, then retries
    expect(hub.status()).toBe("retrying");
    expect(timers).toHaveLength(1);
    timers[0]!();
    expect(sources).toHaveLength(2);
    sources[1]!.open();
    expect(opened).toBe(2);
  });

  it("does not retry for nobody", () => {
    const { hub, sources, timers } = setup();
    const stop = hub.subscribe({});
    sources[0]!.fail(true);
    stop();
    expect(timers).toHaveLength(0);
    expect(sources).toHaveLength(1);
  });
});
