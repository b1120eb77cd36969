import { Router } from "express";
import { compareQuery, verificationQuery } from "../../shared/api/verification.ts";
import { parseInput } from "../http/validate.ts";
import { securedRoutes, type RouteEntry } from "../http/route-table.ts";
import type { VerificationService } from "../verification/verification.service.ts";

export function createVerificationRouter(verification: VerificationService, table: RouteEntry[]): Router {
  const router = Router();
  const routes = securedRoutes(router, "/api/verification", table);

  // Live triggers of a period against the storm reports: counts, scores, lead times, per rule and version.
  routes.get("/", "verification.read", async (req, res) => {
    res.json(await verification.verify(parseInput(verificationQuery, req.query, "query")));
  });

  // Two versions of a rule simulated over the same stored frames (no one is notified) and the same reports.
  routes.get("/compare", "verification.compare", async (req, res) => {
    res.json(await verification.compare(parseInput(compareQuery, req.query, "query")));
  });

  return router;
}
