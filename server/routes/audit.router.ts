import { Router } from "express";
import type { DataSource } from "typeorm";
import { auditExportQuery, auditQuery } from "../../shared/api/audit.ts";
import { parseInput } from "../http/validate.ts";
import { securedRoutes, type RouteEntry } from "../http/route-table.ts";
import { listAudit, verifyAuditChain } from "../audit/audit-log.ts";
import { auditCsv } from "../audit/audit-export.ts";
import { sendCsv } from "../http/send-csv.ts";

export function createAuditRouter(dataSource: DataSource, table: RouteEntry[]): Router {
  const router = Router();
  const routes = securedRoutes(router, "/api/audit", table);

  routes.get("/", "audit.read", async (req, res) => {
    const query = parseInput(auditQuery, req.query, "query");
    const { entries, total } = await listAudit(dataSource, query);
    res.json({ entries, total, page: query.page, pageSize: query.pageSize });
  });

  routes.get("/verify", "audit.verify", async (_req, res) => {
    res.json(await verifyAuditChain(dataSource));
  });

  // The filtered trail as CSV, oldest first, with hashes so the chain can be re-checked outside.
  routes.get("/export.csv", "audit.export", async (req, res) => {
    sendCsv(res, "bellwether-audit", await auditCsv(dataSource, parseInput(auditExportQuery, req.query, "query")));
  });

  return router;
}
