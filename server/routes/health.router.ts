import { Router } from "express";
import { securedRoutes, type RouteEntry } from "../http/route-table.ts";

export function createHealthRouter(table: RouteEntry[]): Router {
  const router = Router();
  securedRoutes(router, "/api/health", table).get("/", "public", (_req, res) => {
    res.json({ status: "ok" });
  });
  return router;
}
