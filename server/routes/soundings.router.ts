import express, { Router, type Request } from "express";
import multer from "multer";
import { diagnoseColumn } from "../../shared/meteo/index.ts";
import { buildSoundingReport } from "../../shared/meteo/sounding-report.ts";
import { parseSoundingCsv, SoundingFormatError, type SoundingProfile } from "../../shared/sounding/csv.ts";
import { securedRoutes, type RouteEntry } from "../http/route-table.ts";
import { AppError, ValidationError } from "../errors.ts";

const MAX_SOUNDING_BYTES = 1024 * 1024;

/** The sounding text from a CSV body, a JSON {"csv": "..."} body, or a multipart "file" upload. */
function soundingText(req: Request): string {
  if (req.file) return req.file.buffer.toString("utf8");
  if (typeof req.body === "string") return req.body;
  if (req.body && typeof req.body === "object" && typeof (req.body as { csv?: unknown }).csv === "string") return (req.body as { csv: string }).csv;
  throw new ValidationError('Send the sounding as a text/csv body, as JSON {"csv": "..."}, or as multipart form field "file".');
}

function parseProfile(req: Request): SoundingProfile {
  try {
    return parseSoundingCsv(soundingText(req));
  } catch (error) {
    if (error instanceof SoundingFormatError) throw new AppError(422, "SOUNDING_INVALID", error.message, { line: error.line });
    throw error;
  }
}

export function createSoundingsRouter(table: RouteEntry[]): Router {
  const router = Router();
  const routes = securedRoutes(router, "/api/soundings", table);
  const csvBody = express.text({ type: ["text/csv", "text/plain"], limit: MAX_SOUNDING_BYTES });
  const upload = multer({ storage: multer.memoryStorage(), limits: { fileSize: MAX_SOUNDING_BYTES, files: 1 } }).single("file");

  // The same flat JSON as `npm run cli -- diagnose <file> --json`: catalogue keys, SI units, null where undefined.
  routes.post("/diagnose", "soundings.diagnose", csvBody, upload, (req, res) => {
    res.json(diagnoseColumn(parseProfile(req)).fields);
  });

  // Everything the Soundings page draws: levels, parcel paths, storm motions, effective layer, fields.
  routes.post("/report", "soundings.diagnose", csvBody, upload, (req, res) => {
    res.json(buildSoundingReport(parseProfile(req)));
  });

  return router;
}
