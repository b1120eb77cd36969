import type { DataSource } from "typeorm";
import { In, Like } from "typeorm";
import type { NotificationDto, NotificationsQuery } from "../../shared/api/notifications.ts";
import { NotificationEntity } from "../entities/notification.entity.ts";
import { DeliveryAttemptEntity } from "../entities/delivery-attempt.entity.ts";
import { appendAudit, type AuditActor } from "../audit/audit-log.ts";
import { writeTransaction } from "../db/data-source.ts";
import { ConflictError, NotFoundError } from "../errors.ts";

/** Who was told what, how, when and with which result: the outbox as people read it. */
export class DeliveryLogService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly now: () => Date,
    private readonly onQueued?: () => void,
  ) {}

  async list(query: NotificationsQuery): Promise<NotificationDto[]> {
    const repo = this.dataSource.getRepository(NotificationEntity);
    const where = query.triggerId
      ? // A digest names its triggers only in the JSON list, so match that too.
        [
          { triggerId: query.triggerId, ...(query.state ? { state: query.state } : {}) },
          { template: "digest" as const, triggerIds: Like(`%${query.triggerId}%`) as never, ...(query.state ? { state: query.state } : {}) },
        ]
      : query.state
        ? { state: query.state }
        : {};
    const rows = (await repo.find({ where, order: { id: "DESC" }, take: query.limit })).filter((r) => !query.triggerId || r.triggerIds.includes(query.triggerId));
    return this.toDtos(rows);
  }

  async get(id: number): Promise<NotificationDto> {
    const row = await this.dataSource.getRepository(NotificationEntity).findOne({ where: { id } });
    if (!row) throw new NotFoundError(`Notification ${id}`);
    return (await this.toDtos([row]))[0]!;
  }

  /** Puts a failed notification back in the queue for a fresh round of attempts. */
  async resend(actor: AuditActor, id: number): Promise<NotificationDto> {
    await writeTransaction(this.dataSource, async (m) => {
      const row = await m.getRepository(NotificationEntity).findOne({ where: { id } });
      if (!row) throw new NotFoundError(`Notification ${id}`);
      if (row.state !== "failed") throw new ConflictError(`Notification ${id} is ${row.state}; only failed notifications can be sent again.`);
      const at = this.now().toISOString();
      await m.getRepository(NotificationEntity).update({ id }, { state: "queued", nextAttemptAt: at, updatedAt: at });
      await appendAudit(m, actor, { action: "notification.resend", targetType: "notification", targetId: id, before: { state: "failed", attempts: row.attempts, lastError: row.lastError }, after: { state: "queued" } }, this.now());
    });
    this.onQueued?.();
    return this.get(id);
  }

  private async toDtos(rows: NotificationEntity[]): Promise<NotificationDto[]> {
    const attempts = rows.length ? await this.dataSource.getRepository(DeliveryAttemptEntity).find({ where: { notificationId: In(rows.map((r) => r.id)) }, order: { attempt: "ASC" } }) : [];
    return rows.map((r) => ({
      id: r.id,
      triggerId: r.triggerId,
      change: r.change,
      level: r.level,
      channel: r.channel,
      contactId: r.contactId,
      recipientName: r.recipientName,
      address: r.address,
      severity: r.severity,
      state: r.state,
      attempts: r.attempts,
      nextAttemptAt: r.state === "queued" ? r.nextAttemptAt : null,
      heldUntil: r.heldUntil,
      digestId: r.digestId,
      providerMessageId: r.providerMessageId,
      lastError: r.lastError,
      createdAt: r.createdAt,
      sentAt: r.sentAt,
      triggerIds: r.triggerIds,
      attemptLog: attempts
        .filter((a) => a.notificationId === r.id)
        .map((a) => ({ attempt: a.attempt, outcome: a.outcome, startedAt: a.startedAt, finishedAt: a.finishedAt, providerMessageId: a.providerMessageId, error: a.error })),
    }));
  }
}
