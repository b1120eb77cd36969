import { z } from "zod";

export const auditQuery = z.object({
  page: z.coerce.number().int().min(1).default(1),
  pageSize: z.coerce.number().int().min(1).max(500).default(50),
  action: z.string().trim().max(80).optional(),
  actor: z.string().trim().max(64).optional(),
  targetType: z.string().trim().max(80).optional(),
  from: z.iso.datetime({ offset: true }).optional(),
  to: z.iso.datetime({ offset: true }).optional(),
});
export type AuditQuery = z.infer<typeof auditQuery>;

/** The same filters without paging: the export takes every matching entry. */
export const auditExportQuery = auditQuery.omit({ page: true, pageSize: true });
export type AuditExportQuery = z.infer<typeof auditExportQuery>;

export const auditEntryDto = z.object({
  id: z.number().int(),
  at: z.string(),
  actor: z.string().nullable(),
  actorRoles: z.array(z.string()),
  action: z.string(),
  targetType: z.string(),
  targetId: z.string().nullable(),
  before: z.unknown().nullable(),
  after: z.unknown().nullable(),
  requestId: z.string().nullable(),
  hash: z.string(),
});
export type AuditEntryDto = z.infer<typeof auditEntryDto>;

export const auditPageDto = z.object({
  entries: z.array(auditEntryDto),
  total: z.number().int(),
  page: z.number().int(),
  pageSize: z.number().int(),
});
export type AuditPageDto = z.infer<typeof auditPageDto>;

export const auditVerifyDto = z.object({
  ok: z.boolean(),
  checked: z.number().int(),
  firstBroken: z.number().int().optional(),
});
export type AuditVerifyDto = z.infer<typeof auditVerifyDto>;
