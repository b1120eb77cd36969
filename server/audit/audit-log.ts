import type { DataSource, EntityManager } from "typeorm";
import { AuditEntryEntity } from "../entities/audit-entry.entity.ts";
import { GENESIS_HASH, hashAuditRow } from "./audit-hash.ts";
import type { AuditEntryDto, AuditQuery, AuditVerifyDto } from "../../shared/api/audit.ts";

/** Who did something: a signed-in user, or the system itself (jobs, seeding). */
export interface AuditActor {
  username: string | null;
  roles: readonly string[];
  requestId?: string | null;
}

export const SYSTEM_ACTOR: AuditActor = { username: null, roles: ["system"] };

export interface AuditRecord {
  action: string;
  targetType: string;
  targetId?: string | number | null;
  before?: unknown;
  after?: unknown;
}

const toJson = (value: unknown): string | null => (value === undefined || value === null ? null : JSON.stringify(value));

/**
 * Appends one entry to the chain. Call it with the manager of the transaction that makes the
 * change, so the change and its audit row commit together or not at all.
 */
export async function appendAudit(manager: EntityManager, actor: AuditActor, record: AuditRecord, now = new Date()): Promise<AuditEntryEntity> {
  const repo = manager.getRepository(AuditEntryEntity);
  const last = await repo.find({ order: { id: "DESC" }, take: 1, select: { id: true, hash: true } });
  const row = repo.create({
    at: now.toISOString(),
    actor: actor.username,
    actorRoles: JSON.stringify(actor.roles),
    action: record.action,
    targetType: record.targetType,
    targetId: record.targetId === undefined || record.targetId === null ? null : String(record.targetId),
    beforeJson: toJson(record.before),
    afterJson: toJson(record.after),
    requestId: actor.requestId ?? null,
    prevHash: last[0]?.hash ?? GENESIS_HASH,
  });
  row.hash = hashAuditRow(row);
  return repo.save(row);
}

/**
 * Walks the whole chain in id order and reports the first row whose stored hash does not match
 * its content, or whose link to the previous row is broken (an edit, insertion or deletion).
 */
export async function verifyAuditChain(dataSource: DataSource, batchSize = 2000): Promise<AuditVerifyDto> {
  const repo = dataSource.getRepository(AuditEntryEntity);
  let prevHash = GENESIS_HASH;
  let checked = 0;
  let afterId = 0;
  for (;;) {
    const rows = await repo
      .createQueryBuilder("a")
      .where("a.id > :afterId", { afterId })
      .orderBy("a.id", "ASC")
      .take(batchSize)
      .getMany();
    if (rows.length === 0) return { ok: true, checked };
    for (const row of rows) {
      if (row.prevHash !== prevHash || hashAuditRow(row) !== row.hash) {
        return { ok: false, checked, firstBroken: row.id };
      }
      prevHash = row.hash;
      checked += 1;
      afterId = row.id;
    }
  }
}

const parseJson = (text: string | null): unknown => (text === null ? null : JSON.parse(text));

export function toAuditEntryDto(row: AuditEntryEntity): AuditEntryDto {
  return {
    id: row.id,
    at: row.at,
    actor: row.actor,
    actorRoles: JSON.parse(row.actorRoles) as string[],
    action: row.action,
    targetType: row.targetType,
    targetId: row.targetId,
    before: parseJson(row.beforeJson),
    after: parseJson(row.afterJson),
    requestId: row.requestId,
    hash: row.hash,
  };
}

/** One filtered page of the trail, newest first. */
export async function listAudit(dataSource: DataSource, query: AuditQuery): Promise<{ entries: AuditEntryDto[]; total: number }> {
  const qb = dataSource.getRepository(AuditEntryEntity).createQueryBuilder("a");
  if (query.action) qb.andWhere("a.action LIKE :action", { action: `${query.action}%` });
  if (query.actor) qb.andWhere("a.actor = :actor", { actor: query.actor });
  if (query.targetType) qb.andWhere("a.target_type = :targetType", { targetType: query.targetType });
  if (query.from) qb.andWhere("a.at >= :from", { from: new Date(query.from).toISOString() });
  if (query.to) qb.andWhere("a.at <= :to", { to: new Date(query.to).toISOString() });
  const [rows, total] = await qb
    .orderBy("a.id", "DESC")
    .skip((query.page - 1) * query.pageSize)
    .take(query.pageSize)
    .getManyAndCount();
  return { entries: rows.map(toAuditEntryDto), total };
}
