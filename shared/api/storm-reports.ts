import { z } from "zod";
import { STORM_REPORT_KINDS } from "../storm-reports/storm-report-kinds.ts";

export const stormReportKindSchema = z.enum(STORM_REPORT_KINDS);

export const stormReportDto = z.object({
  id: z.number().int(),
  time: z.string(),
  latitude: z.number(),
  longitude: z.number(),
  kind: stormReportKindSchema,
  /** As reported, in `magnitudeUnit` (EF rating, in, mm, kt, m/s, mph); null when none was given. */
  magnitude: z.number().nullable(),
  magnitudeUnit: z.string().nullable(),
  /** Hail diameter in m, wind gust in m/s, tornado EF rating. */
  magnitudeSi: z.number().nullable(),
  remarks: z.string(),
  /** The uploaded file's name, or "demo". */
  source: z.string(),
  /** Invented demo data: every screen that shows it says so. */
  invented: z.boolean(),
  uploadedBy: z.string().nullable(),
  uploadedAt: z.string(),
});
export type StormReportDto = z.infer<typeof stormReportDto>;

const isoTime = z.iso.datetime({ offset: true });

export const stormReportsQuery = z.object({
  from: isoTime.optional(),
  to: isoTime.optional(),
  kind: stormReportKindSchema.optional(),
  limit: z.coerce.number().int().min(1).max(10_000).default(2000),
});
export type StormReportsQuery = z.infer<typeof stormReportsQuery>;

export const stormReportListDto = z.object({ reports: z.array(stormReportDto), truncated: z.boolean() });
export type StormReportListDto = z.infer<typeof stormReportListDto>;

/** What became of one uploaded file: stored rows, rows that repeat a known report, refused rows. */
export const stormReportUploadDto = z.object({
  fileName: z.string(),
  rows: z.number().int(),
  stored: z.array(stormReportDto),
  duplicates: z.array(
    z.object({
      line: z.number().int(),
      /** The stored report it repeats, or the earlier line of the same file. */
      duplicateOfReportId: z.number().int().nullable(),
      duplicateOfLine: z.number().int().nullable(),
    }),
  ),
  refused: z.array(z.object({ line: z.number().int(), reason: z.string() })),
});
export type StormReportUploadDto = z.infer<typeof stormReportUploadDto>;
