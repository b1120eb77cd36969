import { z } from "zod";

export const INGEST_STATES = ["queued", "decoding", "diagnosing", "ready", "failed"] as const;

export const ingestJobDto = z.object({
  id: z.number().int(),
  source: z.enum(["upload", "inbox", "demo"]),
  originalName: z.string(),
  sizeBytes: z.number().int(),
  format: z.string(),
  sha256: z.string(),
  state: z.enum(INGEST_STATES),
  progress: z.number(),
  stageNote: z.string().nullable(),
  failureReason: z.string().nullable(),
  ignoredFields: z.array(z.string()),
  submittedBy: z.string().nullable(),
  createdAt: z.string(),
  startedAt: z.string().nullable(),
  finishedAt: z.string().nullable(),
  frameCount: z.number().int(),
});
export type IngestJobDto = z.infer<typeof ingestJobDto>;

export const fieldInfoDto = z.object({
  key: z.string(),
  unit: z.string(),
  min: z.number().nullable(),
  max: z.number().nullable(),
  nanCount: z.number().int(),
});
export type FieldInfoDto = z.infer<typeof fieldInfoDto>;

export const frameSummaryDto = z.object({
  id: z.number().int(),
  runId: z.number().int(),
  model: z.string(),
  runTime: z.string(),
  validTime: z.string(),
  forecastHour: z.number(),
  ingestJobId: z.number().int(),
});
export type FrameSummaryDto = z.infer<typeof frameSummaryDto>;

export const runDto = z.object({
  id: z.number().int(),
  model: z.string(),
  runTime: z.string(),
  frames: z.array(frameSummaryDto),
});
export type RunDto = z.infer<typeof runDto>;

export const frameDetailDto = frameSummaryDto.extend({
  geometry: z.record(z.string(), z.unknown()),
  levels: z.array(z.number()),
  fields: z.array(fieldInfoDto),
});
export type FrameDetailDto = z.infer<typeof frameDetailDto>;

export const jobsQuery = z.object({
  limit: z.coerce.number().int().min(1).max(500).default(100),
  state: z.enum(INGEST_STATES).optional(),
});

export const runsQuery = z.object({
  limit: z.coerce.number().int().min(1).max(200).default(20),
});

export const idParams = z.object({ id: z.coerce.number().int().positive() });

export const fieldParams = z.object({
  id: z.coerce.number().int().positive(),
  key: z.string().regex(/^[a-z0-9_]{1,60}$/, "Field keys are lower-case letters, digits and underscores"),
});

export const latLonQuery = z.object({
  lat: z.coerce.number().min(-90).max(90),
  lon: z.coerce.number().min(-180).max(360),
});

const geometryBase = { nx: z.number().int().positive(), ny: z.number().int().positive(), earthRadius: z.number().positive(), uvRelativeToGrid: z.boolean() };

/** A frame's grid geometry as the API sends it (see shared/grid/geometry-types.ts for the meaning of each value). */
export const gridGeometryDto = z.discriminatedUnion("kind", [
  z.object({ kind: z.literal("latlon"), ...geometryBase, lat0: z.number(), lon0: z.number(), dlat: z.number().positive(), dlon: z.number().positive() }),
  z.object({
    kind: z.literal("lambert"),
    ...geometryBase,
    lat0: z.number(),
    lon0: z.number(),
    dx: z.number().positive(),
    dy: z.number().positive(),
    lonV: z.number(),
    latin1: z.number(),
    latin2: z.number(),
  }),
  z.object({
    kind: z.literal("polar"),
    ...geometryBase,
    lat0: z.number(),
    lon0: z.number(),
    dx: z.number().positive(),
    dy: z.number().positive(),
    lonV: z.number(),
    latTrue: z.number(),
    southPole: z.boolean(),
  }),
]);

/** One vertex of a jet-streak axis: position and signed distance from the core (m, positive downstream). */
export const jetAxisVertexDto = z.object({ lat: z.number(), lon: z.number(), i: z.number(), j: z.number(), s: z.number() });

/** A jet streak found on a frame's jet level (shared/meteo/jet/jet-types.ts `JetStreak`). */
export const jetStreakDto = z.object({
  id: z.number().int(),
  core: z.object({ lat: z.number(), lon: z.number(), i: z.number(), j: z.number(), speed: z.number() }),
  hemisphere: z.enum(["north", "south"]),
  axis: z.array(jetAxisVertexDto),
  curvatureClass: z.union([z.literal(-1), z.literal(0), z.literal(1)]),
  curvatureStrong: z.boolean(),
  // NaN turning (no axis to measure) arrives as null in JSON.
  turningAngleDegrees: z.number().nullable(),
  labelledPoints: z.number().int(),
});
export type JetStreakDto = z.infer<typeof jetStreakDto>;

/** `GET /api/grids/frames/:id/jet-streaks`: the jet level (Pa; null for frames stored before jet diagnostics), its streaks and data-quality notes. */
export const jetStreaksDto = z.object({
  jetLevelPressure: z.number().nullable(),
  streaks: z.array(jetStreakDto),
  warnings: z.array(z.string()),
});
export type JetStreaksDto = z.infer<typeof jetStreaksDto>;
