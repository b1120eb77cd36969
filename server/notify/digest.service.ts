import type { DataSource } from "typeorm";
import { LessThanOrEqual } from "typeorm";
import { NotificationEntity } from "../entities/notification.entity.ts";
import { appendAudit, SYSTEM_ACTOR } from "../audit/audit-log.ts";
import { writeTransaction } from "../db/data-source.ts";

/**
 * Quiet-hours digests: when a contact's quiet hours end, every message held for them on one
 * channel goes out as a single digest row through the normal outbox. The held rows are marked
 * "digested" and point at it, so the delivery screen shows where each one went.
 */
export class DigestService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly now: () => Date,
    private readonly onQueued?: () => void,
  ) {}

  /** Turns held rows whose quiet hours are over into digests; returns how many digests were queued. */
  async releaseDue(): Promise<number> {
    const created = await writeTransaction(this.dataSource, async (m) => {
      const now = this.now();
      const at = now.toISOString();
      const repo = m.getRepository(NotificationEntity);
      const due = await repo.find({ where: { state: "held", heldUntil: LessThanOrEqual(at) }, order: { id: "ASC" } });
      const groups = new Map<string, NotificationEntity[]>();
      for (const row of due) {
        const key = `${row.contactId}|${row.channel}|${row.address}`;
        groups.set(key, [...(groups.get(key) ?? []), row]);
      }
      let count = 0;
      for (const rows of groups.values()) {
        const first = rows[0]!;
        const triggerIds = [...new Set(rows.flatMap((r) => r.triggerIds))];
        const idempotencyKey = `digest.c${first.contactId}.${first.channel}.${rows.map((r) => r.id).join("-")}`.slice(0, 160);
        const digest = await repo.save(
          repo.create({
            triggerId: triggerIds.length === 1 ? triggerIds[0]! : null,
            triggerIds,
            change: "digest",
            level: null,
            channel: first.channel,
            contactId: first.contactId,
            recipientName: first.recipientName,
            address: first.address,
            template: "digest",
            severity: "heads-up",
            idempotencyKey,
            state: "queued",
            attempts: 0,
            nextAttemptAt: at,
            heldUntil: null,
            digestId: null,
            providerMessageId: null,
            lastError: null,
            createdAt: at,
            updatedAt: at,
            sentAt: null,
          }),
        );
        for (const row of rows) Object.assign(row, { state: "digested", digestId: digest.id, updatedAt: at });
        await repo.save(rows);
        await appendAudit(m, SYSTEM_ACTOR, { action: "notification.digest_queued", targetType: "notification", targetId: digest.id, after: { contactId: first.contactId, channel: first.channel, heldIds: rows.map((r) => r.id), triggerIds } }, now);
        count++;
      }
      return count;
    });
    if (created > 0) this.onQueued?.();
    return created;
  }
}
