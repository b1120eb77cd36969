import { z } from "zod";
import { gridGeometryDto } from "@shared/api/grids.ts";

/**
 * The preview and backtest replies as the client checks them at the edge (server/rules/rule-map.service.ts
 * builds them). Masks are packed bits (shared/grid/mask-bits.ts), decoded only when drawn.
 */
export const mapFrameSummary = z.object({
  id: z.number().int(),
  model: z.string(),
  runTime: z.string(),
  validTime: z.string(),
  forecastHour: z.number(),
});
export type MapFrameSummary = z.infer<typeof mapFrameSummary>;

const fieldSummary = z.object({ key: z.string(), max: z.number().nullable(), min: z.number().nullable(), mean: z.number().nullable(), points: z.number() });

export const previewZoneDto = z.object({
  zoneId: z.number().int(),
  met: z.boolean(),
  reason: z.string(),
  summary: z.object({
    zonePoints: z.number(),
    decidedPoints: z.number(),
    matchedPoints: z.number(),
    coveragePercent: z.number().nullable(),
    fields: z.array(fieldSummary),
  }),
});
export type PreviewZoneDto = z.infer<typeof previewZoneDto>;

export const previewDto = z.object({
  frame: mapFrameSummary,
  geometry: gridGeometryDto,
  missingFields: z.array(z.string()),
  mask: z.string().nullable(),
  zones: z.array(previewZoneDto),
});
export type PreviewDto = z.infer<typeof previewDto>;

export const backtestZoneDto = z.object({
  zoneId: z.number().int(),
  met: z.boolean(),
  reason: z.string(),
  coveragePercent: z.number().nullable(),
  matchedPoints: z.number(),
  /** What the trigger logic did with this frame: open, extend, retract or nothing. */
  decision: z.string(),
});
export type BacktestZoneDto = z.infer<typeof backtestZoneDto>;

export const backtestDto = z.object({
  ruleId: z.number().int(),
  versionId: z.number().int(),
  version: z.number().int(),
  geometry: gridGeometryDto.nullable(),
  frames: z.array(z.object({ frame: mapFrameSummary, zones: z.array(backtestZoneDto), mask: z.string().nullable(), missingFields: z.array(z.string()) })),
  wouldOpen: z.number().int(),
  opened: z.array(z.object({ zoneId: z.number().int(), firstValidTime: z.string(), runTime: z.string() })),
});
export type BacktestDto = z.infer<typeof backtestDto>;
