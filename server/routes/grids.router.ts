import fs from "node:fs";
import path from "node:path";
import { Router } from "express";
import multer from "multer";
import { fieldParams, idParams, jobsQuery, latLonQuery, runsQuery } from "../../shared/api/grids.ts";
import { parseInput } from "../http/validate.ts";
import { securedRoutes, type RouteEntry } from "../http/route-table.ts";
import { actorOf } from "../auth/current-user.ts";
import { AppError, ValidationError } from "../errors.ts";
import type { IngestService } from "../ingest/ingest.service.ts";
import { toIngestJobDto, type GridQueryService } from "../grids/grid-query.service.ts";
import { detectGridFormat, describeUnknownFormat } from "../ingest/detect-format.ts";
import { appendAudit } from "../audit/audit-log.ts";
import { writeTransaction } from "../db/data-source.ts";
import type { DataSource } from "typeorm";

export interface GridsRouterDeps {
  dataSource: DataSource;
  dataDir: string;
  ingest: IngestService;
  grids: GridQueryService;
  uploadMaxBytes: number;
}

function readHead(file: string): Uint8Array {
  const fd = fs.openSync(file, "r");
  try {
    const head = Buffer.alloc(16);
    return head.subarray(0, fs.readSync(fd, head, 0, 16, 0));
  } finally {
    fs.closeSync(fd);
  }
}

export function createGridsRouter(deps: GridsRouterDeps, table: RouteEntry[]): Router {
  const router = Router();
  const routes = securedRoutes(router, "/api/grids", table);
  const incoming = path.join(deps.dataDir, "incoming");
  fs.mkdirSync(incoming, { recursive: true });
  const upload = multer({ dest: incoming, limits: { fileSize: deps.uploadMaxBytes, files: 1, fields: 5 } });

  routes.post("/", "grids.upload", upload.single("file"), async (req, res) => {
    const file = req.file;
    if (!file) throw new ValidationError('Send the grid file as multipart form field "file".');
    // The type is decided by the file's first bytes, never by its name.
    const head = readHead(file.path);
    if (!detectGridFormat(head)) {
      fs.rmSync(file.path, { force: true });
      throw new AppError(415, "UNSUPPORTED_FILE", describeUnknownFormat(head));
    }
    const actor = actorOf(req);
    const { job, duplicate } = await deps.ingest.submitFile(file.path, { originalName: file.originalname, source: "upload", submittedBy: actor.username });
    if (!duplicate) {
      await writeTransaction(deps.dataSource, (m) =>
        appendAudit(m, actor, { action: "grid.uploaded", targetType: "ingest_job", targetId: job.id, after: { name: job.originalName, sha256: job.sha256, sizeBytes: job.sizeBytes } }),
      );
    }
    res.status(duplicate ? 200 : 202).json({ job: toIngestJobDto(job), duplicate });
  });

  routes.get("/jobs", "grids.read", async (req, res) => {
    const q = parseInput(jobsQuery, req.query, "query");
    res.json({ jobs: await deps.grids.listJobs(q.limit, q.state) });
  });

  routes.get("/jobs/:id", "grids.read", async (req, res) => {
    const { id } = parseInput(idParams, req.params, "params");
    res.json({ job: await deps.grids.getJob(id) });
  });

  routes.get("/runs", "grids.read", async (req, res) => {
    const q = parseInput(runsQuery, req.query, "query");
    res.json({ runs: await deps.grids.listRuns(q.limit) });
  });

  routes.get("/frames/:id", "grids.read", async (req, res) => {
    const { id } = parseInput(idParams, req.params, "params");
    res.json({ frame: await deps.grids.getFrame(id) });
  });

  // Raw little-endian Float32 values in canonical order (index = j * nx + i); NaN = no value.
  routes.get("/frames/:id/fields/:key", "grids.read", async (req, res) => {
    const { id, key } = parseInput(fieldParams, req.params, "params");
    const { geometry, values } = await deps.grids.readField(id, key);
    res.set({ "content-type": "application/octet-stream", "x-grid-nx": String(geometry.nx), "x-grid-ny": String(geometry.ny), "cache-control": "private, max-age=3600" });
    res.send(Buffer.from(values.buffer, values.byteOffset, values.byteLength));
  });

  // Jet streaks found on the frame's jet level: cores, axes, curvature, data-quality notes.
  routes.get("/frames/:id/jet-streaks", "grids.read", async (req, res) => {
    const { id } = parseInput(idParams, req.params, "params");
    res.json(await deps.grids.jetStreaks(id));
  });

  routes.get("/frames/:id/column", "grids.read", async (req, res) => {
    const { id } = parseInput(idParams, req.params, "params");
    const { lat, lon } = parseInput(latLonQuery, req.query, "query");
    res.json(await deps.grids.columnAt(id, lat, lon));
  });

  return router;
}
