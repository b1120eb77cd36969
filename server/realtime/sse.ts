import type { Request, Response } from "express";
import type { EventBus } from "./event-bus.ts";

/**
 * Server-Sent Events: one long response per browser tab. A comment line every 20 s keeps proxies
 * from closing an idle stream; the client's EventSource reconnects by itself after a drop.
 */
export function serveEvents(bus: EventBus, req: Request, res: Response, heartbeatMs = 20_000): void {
  res.writeHead(200, {
    "content-type": "text/event-stream; charset=utf-8",
    "cache-control": "no-cache, no-transform",
    connection: "keep-alive",
    "x-accel-buffering": "no",
  });
  res.write("retry: 3000\n\n");
  const unsubscribe = bus.onAny((name, payload) => {
    res.write(`event: ${name}\ndata: ${JSON.stringify(payload)}\n\n`);
  });
  const heartbeat = setInterval(() => res.write(": heartbeat\n\n"), heartbeatMs);
  heartbeat.unref();
  req.on("close", () => {
    clearInterval(heartbeat);
    unsubscribe();
  });
}
