import { Router } from "express";
import multer from "multer";
import { createZoneInput, importZonesInput, updateZoneInput } from "../../shared/api/zones.ts";
import { idParams } from "../../shared/api/grids.ts";
import { parseInput } from "../http/validate.ts";
import { securedRoutes, type RouteEntry } from "../http/route-table.ts";
import { actorOf } from "../auth/current-user.ts";
import { ValidationError } from "../errors.ts";
import type { ZoneService } from "../services/zone.service.ts";

export function createZonesRouter(zones: ZoneService, table: RouteEntry[]): Router {
  const router = Router();
  const routes = securedRoutes(router, "/api/zones", table);
  const upload = multer({ storage: multer.memoryStorage(), limits: { fileSize: 5 * 1024 * 1024, files: 1 } }).single("file");

  routes.get("/", "zones.read", async (_req, res) => {
    res.json({ zones: await zones.list() });
  });

  routes.get("/:id", "zones.read", async (req, res) => {
    const { id } = parseInput(idParams, req.params, "params");
    res.json({ zone: await zones.get(id) });
  });

  routes.post("/", "zones.write", async (req, res) => {
    const input = parseInput(createZoneInput, req.body, "body");
    res.status(201).json({ zone: await zones.create(actorOf(req), input) });
  });

  // A GeoJSON FeatureCollection as the JSON body or as an uploaded .geojson file; all or nothing.
  routes.post("/import", "zones.write", upload, async (req, res) => {
    let body: unknown = req.body;
    if (req.file) {
      try {
        body = JSON.parse(req.file.buffer.toString("utf8"));
      } catch {
        throw new ValidationError("The uploaded file is not valid JSON (expected a GeoJSON FeatureCollection).");
      }
    }
    const collection = parseInput(importZonesInput, body, "body");
    const created = await zones.importMany(
      actorOf(req),
      collection.features.map((f) => ({ code: f.properties.code, name: f.properties.name, geometry: f.geometry })),
    );
    res.status(201).json({ zones: created });
  });

  routes.patch("/:id", "zones.write", async (req, res) => {
    const { id } = parseInput(idParams, req.params, "params");
    const input = parseInput(updateZoneInput, req.body, "body");
    res.json({ zone: await zones.update(actorOf(req), id, input) });
  });

  routes.delete("/:id", "zones.write", async (req, res) => {
    const { id } = parseInput(idParams, req.params, "params");
    await zones.archive(actorOf(req), id);
    res.status(204).end();
  });

  return router;
}
