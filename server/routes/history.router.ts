import { Router } from "express";
import { historyFilters, historyQuery } from "../../shared/api/history.ts";
import { idParams } from "../../shared/api/grids.ts";
import { parseInput } from "../http/validate.ts";
import { securedRoutes, type RouteEntry } from "../http/route-table.ts";
import { sendCsv } from "../http/send-csv.ts";
import type { HistoryService } from "../history/history.service.ts";

export function createHistoryRouter(history: HistoryService, table: RouteEntry[]): Router {
  const router = Router();
  const routes = securedRoutes(router, "/api/history", table);

  // Every trigger matching the filters, newest first, with the summary figures of the review.
  routes.get("/triggers", "history.read", async (req, res) => {
    res.json(await history.list(parseInput(historyQuery, req.query, "query")));
  });

  // The same filters as the list; scripts rely on this path and its header row (README).
  routes.get("/triggers.csv", "history.read", async (req, res) => {
    sendCsv(res, "bellwether-trigger-history", await history.csv(parseInput(historyFilters, req.query, "query")));
  });

  routes.get("/triggers/:id", "history.read", async (req, res) => {
    const { id } = parseInput(idParams, req.params, "params");
    res.json(await history.detail(id));
  });

  return router;
}
