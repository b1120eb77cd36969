import type { DataSource } from "typeorm";
import type { AuditExportQuery } from "../../shared/api/audit.ts";
import { csvDocument } from "../../shared/csv/csv-text.ts";
import { AuditEntryEntity } from "../entities/audit-entry.entity.ts";

/**
 * Columns of the audit CSV: every stored field exactly as stored (an empty cell is a null), hashes
 * included, so a reviewer can recompute the chain from the file alone.
 */
export const AUDIT_CSV_HEADER = ["id", "at", "actor", "actor_roles", "action", "target_type", "target_id", "before", "after", "request_id", "prev_hash", "hash"] as const;
export const MAX_AUDIT_EXPORT_ROWS = 100_000;
const BATCH = 2000;

/** The filtered trail as CSV, oldest first (the chain's own order), read in batches. */
export async function auditCsv(dataSource: DataSource, query: AuditExportQuery): Promise<string> {
  const rows: AuditEntryEntity[] = [];
  let afterId = 0;
  while (rows.length < MAX_AUDIT_EXPORT_ROWS) {
    const qb = dataSource.getRepository(AuditEntryEntity).createQueryBuilder("a").where("a.id > :afterId", { afterId });
    if (query.action) qb.andWhere("a.action LIKE :action", { action: `${query.action}%` });
    if (query.actor) qb.andWhere("a.actor = :actor", { actor: query.actor });
    if (query.targetType) qb.andWhere("a.target_type = :targetType", { targetType: query.targetType });
    if (query.from) qb.andWhere("a.at >= :from", { from: new Date(query.from).toISOString() });
    if (query.to) qb.andWhere("a.at <= :to", { to: new Date(query.to).toISOString() });
    const batch = await qb.orderBy("a.id", "ASC").take(Math.min(BATCH, MAX_AUDIT_EXPORT_ROWS - rows.length)).getMany();
    if (batch.length === 0) break;
    rows.push(...batch);
    afterId = batch.at(-1)!.id;
  }
  return csvDocument(
    AUDIT_CSV_HEADER,
    rows.map((r) => [r.id, r.at, r.actor, r.actorRoles, r.action, r.targetType, r.targetId, r.beforeJson, r.afterJson, r.requestId, r.prevHash, r.hash]),
    { verbatim: true },
  );
}
