import { z } from "zod";
import { COLUMN_FIELD_KEYS, type ColumnFieldKey } from "../fields.ts";
import { frameSummaryDto } from "./grids.ts";

/**
 * Wire schemas for the sounding routes (POST /api/soundings/report, GET /api/grids/frames/:id/column). The
 * server builds these objects with shared/meteo/sounding-report.ts; the client checks every reply against them.
 * Numbers that were NaN on the server arrive as null (JSON has no NaN), so numeric arrays allow null.
 */

/** Largest sounding text the server accepts (matches the route's body limit). */
export const MAX_SOUNDING_CSV_BYTES = 1024 * 1024;

export const soundingCsvInput = z.object({
  csv: z.string().min(1, "The sounding text is empty").max(MAX_SOUNDING_CSV_BYTES, "The sounding text is larger than 1 MB"),
});
export type SoundingCsvInput = z.infer<typeof soundingCsvInput>;

const maybeNumber = z.number().nullable();

const fieldShape = Object.fromEntries(COLUMN_FIELD_KEYS.map((key) => [key, maybeNumber])) as Record<ColumnFieldKey, typeof maybeNumber>;
export const columnFieldsDto = z.object(fieldShape);
export type ColumnFieldsDto = z.infer<typeof columnFieldsDto>;

export const parcelTraceDto = z.object({
  pressure: z.array(maybeNumber),
  temperature: z.array(maybeNumber),
  virtualTemperature: z.array(maybeNumber),
  lclPressure: maybeNumber,
  lfcPressure: maybeNumber,
  elPressure: maybeNumber,
});
export type ParcelTraceDto = z.infer<typeof parcelTraceDto>;

export const soundingLevelDto = z.object({
  pressure: z.number(),
  height: z.number(),
  temperature: z.number(),
  dewpoint: z.number(),
  u: maybeNumber,
  v: maybeNumber,
});
export type SoundingLevelDto = z.infer<typeof soundingLevelDto>;

const windPair = z.tuple([z.number(), z.number()]);

export const soundingReportDto = z.object({
  fields: columnFieldsDto,
  meta: z.object({
    elCapped: z.object({ sb: z.boolean(), ml: z.boolean(), mu: z.boolean() }),
    muSource: z.object({ pressure: maybeNumber, height: maybeNumber }),
    options: z.object({ virtualCorrection: z.boolean(), hemisphere: z.enum(["north", "south"]) }),
  }),
  levels: z.array(soundingLevelDto).min(1),
  parcels: z.object({ sb: parcelTraceDto.nullable(), ml: parcelTraceDto.nullable(), mu: parcelTraceDto.nullable() }),
  stormMotion: z.object({ rm: windPair, lm: windPair }).nullable(),
  effectiveLayer: z.object({ baseHeight: z.number(), topHeight: z.number() }).nullable(),
});
export type SoundingReportDto = z.infer<typeof soundingReportDto>;

export const columnAtPointDto = z.object({
  frame: frameSummaryDto,
  point: z.object({ i: z.number().int(), j: z.number().int(), lat: z.number(), lon: z.number() }),
  report: soundingReportDto,
});
export type ColumnAtPointDto = z.infer<typeof columnAtPointDto>;

/** `?frame=<id>&lat=<lat>&lon=<lon>` on the Soundings page: the model column nearest a map point. */
export const columnLinkQuery = z.object({
  frame: z.coerce.number().int().positive("frame must be a positive frame id"),
  lat: z.coerce.number().min(-90, "lat must be between -90 and 90").max(90, "lat must be between -90 and 90"),
  lon: z.coerce.number().min(-180, "lon must be between -180 and 360").max(360, "lon must be between -180 and 360"),
});
export type ColumnLinkQuery = z.infer<typeof columnLinkQuery>;
