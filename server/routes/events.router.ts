import { Router } from "express";
import { securedRoutes, type RouteEntry } from "../http/route-table.ts";
import type { EventBus } from "../realtime/event-bus.ts";
import { serveEvents } from "../realtime/sse.ts";

export function createEventsRouter(bus: EventBus, table: RouteEntry[]): Router {
  const router = Router();
  securedRoutes(router, "/api/events", table).get("/", "signed-in", (req, res) => serveEvents(bus, req, res));
  return router;
}
