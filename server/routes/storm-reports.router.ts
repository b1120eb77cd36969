import express, { Router, type Request } from "express";
import multer from "multer";
import { z } from "zod";
import { stormReportsQuery } from "../../shared/api/storm-reports.ts";
import { parseInput } from "../http/validate.ts";
import { securedRoutes, type RouteEntry } from "../http/route-table.ts";
import { actorOf } from "../auth/current-user.ts";
import { ValidationError } from "../errors.ts";
import type { StormReportService } from "../storm-reports/storm-report.service.ts";

const MAX_UPLOAD_BYTES = 2 * 1024 * 1024;
const jsonUpload = z.object({ csv: z.string(), fileName: z.string().trim().min(1).max(200).default("pasted.csv") });

/** The CSV text and a name for it: a multipart "file", a text/csv body (?fileName=), or JSON {"csv", "fileName"}. */
function uploadedText(req: Request): { fileName: string; text: string } {
  if (req.file) return { fileName: req.file.originalname.slice(0, 200) || "upload.csv", text: req.file.buffer.toString("utf8") };
  if (typeof req.body === "string") {
    const name = typeof req.query.fileName === "string" && req.query.fileName.trim() ? req.query.fileName.trim().slice(0, 200) : "upload.csv";
    return { fileName: name, text: req.body };
  }
  if (req.body && typeof req.body === "object" && "csv" in req.body) {
    const { csv, fileName } = parseInput(jsonUpload, req.body, "body");
    return { fileName, text: csv };
  }
  throw new ValidationError('Send the reports as multipart form field "file", as a text/csv body, or as JSON {"csv": "...", "fileName": "..."}.');
}

export function createStormReportsRouter(reports: StormReportService, table: RouteEntry[]): Router {
  const router = Router();
  const routes = securedRoutes(router, "/api/storm-reports", table);
  const csvBody = express.text({ type: ["text/csv", "text/plain"], limit: MAX_UPLOAD_BYTES });
  const upload = multer({ storage: multer.memoryStorage(), limits: { fileSize: MAX_UPLOAD_BYTES, files: 1 } }).single("file");

  routes.get("/", "reports.read", async (req, res) => {
    res.json(await reports.list(parseInput(stormReportsQuery, req.query, "query")));
  });

  // Good rows are stored, duplicates and bad rows are listed back with their file lines.
  routes.post("/", "reports.upload", csvBody, upload, async (req, res) => {
    const { fileName, text } = uploadedText(req);
    res.status(201).json(await reports.upload(actorOf(req), fileName, text));
  });

  return router;
}
