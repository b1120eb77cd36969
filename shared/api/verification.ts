import { z } from "zod";
import { STORM_REPORT_KINDS, type StormReportKind } from "../storm-reports/storm-report-kinds.ts";
import { stormReportDto } from "./storm-reports.ts";

const isoTime = z.iso.datetime({ offset: true });
const id = z.coerce.number().int().positive();

/** How a report is placed against a trigger: its zone, or the area where the rule matched. */
export const SPACE_MODES = ["zone", "area"] as const;
export type SpaceMode = (typeof SPACE_MODES)[number];
export const DEFAULT_DISTANCE_KM: Record<SpaceMode, number> = { zone: 0, area: 25 };
export const DEFAULT_WINDOW_HOURS = 1;

/** "tornado,hail" in a query string → ["tornado", "hail"]; empty means every kind. */
const kindList = z
  .union([z.string(), z.array(z.string())])
  .transform((value) => (Array.isArray(value) ? value : value.split(",")).map((k) => k.trim()).filter((k) => k !== ""))
  .pipe(z.array(z.enum(STORM_REPORT_KINDS)))
  .transform((kinds): StormReportKind[] => [...new Set(kinds)]);

const matchingOptions = {
  space: z.enum(SPACE_MODES).default("zone"),
  /** Extra distance allowed beyond the zone (zone mode) or from the matched area (area mode). */
  distanceKm: z.coerce.number().min(0).max(300).optional(),
  windowHours: z.coerce.number().min(0).max(48).default(DEFAULT_WINDOW_HOURS),
  kinds: kindList.optional(),
};

export const verificationQuery = z
  .object({ from: isoTime, to: isoTime, ruleId: id.optional(), ruleVersionId: id.optional(), ...matchingOptions })
  .refine((q) => Date.parse(q.from) < Date.parse(q.to), { message: "from must be before to", path: ["to"] });
export type VerificationQuery = z.infer<typeof verificationQuery>;

export const compareQuery = z
  .object({
    ruleId: id,
    versionA: id,
    versionB: id,
    /** How many of the newest stored runs to simulate over. */
    runs: z.coerce.number().int().min(1).max(20).default(3),
    ...matchingOptions,
  })
  .refine((q) => q.versionA !== q.versionB, { message: "Pick two different versions", path: ["versionB"] });
export type CompareQuery = z.infer<typeof compareQuery>;

export const countsDto = z.object({
  verifiedTriggers: z.number().int(),
  falseAlarms: z.number().int(),
  detectedReports: z.number().int(),
  misses: z.number().int(),
});
export const scoresDto = z.object({
  pod: z.number().nullable(),
  far: z.number().nullable(),
  successRatio: z.number().nullable(),
  csi: z.number().nullable(),
  bias: z.number().nullable(),
});
export const leadTimeDto = z.object({
  median: z.number().nullable(),
  p90: z.number().nullable(),
  /** Lead time of every detected report, minutes. */
  minutes: z.array(z.number()),
});
export type LeadTimeDto = z.infer<typeof leadTimeDto>;

export const scoreRowDto = z.object({
  ruleId: z.number().int(),
  ruleName: z.string(),
  versionId: z.number().int().nullable(),
  version: z.number().int().nullable(),
  triggers: z.number().int(),
  reports: z.number().int(),
  counts: countsDto,
  scores: scoresDto,
  leadTime: leadTimeDto,
});
export type ScoreRowDto = z.infer<typeof scoreRowDto>;

export const verifiedTriggerDto = z.object({
  id: z.number().int(),
  ruleId: z.number().int(),
  ruleName: z.string(),
  versionId: z.number().int(),
  version: z.number().int(),
  zoneId: z.number().int(),
  zoneCode: z.string(),
  openedAt: z.string(),
  firstValidTime: z.string(),
  lastValidTime: z.string(),
  verified: z.boolean(),
  reportIds: z.array(z.number().int()),
  /** Area mode only: the matched area could not be rebuilt (frames pruned), so the zone was used. */
  usedZoneInstead: z.boolean(),
});
export type VerifiedTriggerDto = z.infer<typeof verifiedTriggerDto>;

export const matchedReportDto = stormReportDto.extend({
  outcome: z.enum(["detected", "late", "missed"]),
  triggerIds: z.array(z.number().int()),
  lateTriggerIds: z.array(z.number().int()),
  leadMinutes: z.number().nullable(),
});
export type MatchedReportDto = z.infer<typeof matchedReportDto>;

export const matchingOptionsDto = z.object({
  space: z.enum(SPACE_MODES),
  distanceKm: z.number(),
  windowHours: z.number(),
  kinds: z.array(z.enum(STORM_REPORT_KINDS)),
});
export type MatchingOptionsDto = z.infer<typeof matchingOptionsDto>;

export const verificationDto = z.object({
  from: z.string(),
  to: z.string(),
  options: matchingOptionsDto,
  /** The whole selection scored together (one rule, one version, or every rule). */
  overall: scoreRowDto.omit({ ruleId: true, ruleName: true, versionId: true, version: true }),
  byRule: z.array(scoreRowDto),
  byVersion: z.array(scoreRowDto),
  triggers: z.array(verifiedTriggerDto),
  reports: z.array(matchedReportDto),
  /** Zones of the scored triggers, for the map: GeoJSON geometry per zone. */
  zones: z.array(z.object({ id: z.number().int(), code: z.string(), name: z.string(), geometry: z.unknown() })),
});
export type VerificationDto = z.infer<typeof verificationDto>;

export const simulatedTriggerDto = z.object({
  zoneId: z.number().int(),
  zoneCode: z.string(),
  openedAt: z.string(),
  firstValidTime: z.string(),
  lastValidTime: z.string(),
  verified: z.boolean(),
  reportIds: z.array(z.number().int()),
});
export type SimulatedTriggerDto = z.infer<typeof simulatedTriggerDto>;

export const versionComparisonDto = z.object({
  ruleId: z.number().int(),
  ruleName: z.string(),
  options: matchingOptionsDto,
  runs: z.array(z.object({ model: z.string(), runTime: z.string() })),
  frames: z.number().int(),
  /** The span of valid times simulated (± the time window): reports inside it were scored. */
  from: z.string().nullable(),
  to: z.string().nullable(),
  versions: z.array(
    z.object({
      versionId: z.number().int(),
      version: z.number().int(),
      expression: z.string(),
      triggers: z.array(simulatedTriggerDto),
      counts: countsDto,
      scores: scoresDto,
      leadTime: leadTimeDto,
    }),
  ),
  reports: z.array(stormReportDto.extend({ detectedBy: z.array(z.number().int()) })),
});
export type VersionComparisonDto = z.infer<typeof versionComparisonDto>;
