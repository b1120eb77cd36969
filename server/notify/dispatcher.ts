import type { DataSource, EntityManager } from "typeorm";
import { In, LessThanOrEqual } from "typeorm";
import PQueue from "p-queue";
import type { Logger } from "pino";
import { CHANNEL_LABELS, type Channel } from "../../shared/api/notifications.ts";
import { NotificationEntity } from "../entities/notification.entity.ts";
import { DeliveryAttemptEntity } from "../entities/delivery-attempt.entity.ts";
import { TriggerEntity } from "../entities/trigger.entity.ts";
import { appendAudit, SYSTEM_ACTOR } from "../audit/audit-log.ts";
import { writeTransaction } from "../db/data-source.ts";
import type { TriggerService } from "../services/trigger.service.ts";
import { SendError, type SendResult } from "./channels/channel-types.ts";
import type { Transports } from "./transports.ts";
import type { MessageBuilder } from "./message-builder.ts";
import { retryDelayMs, type RetryPolicy } from "./retry-policy.ts";

export interface DispatcherOptions extends RetryPolicy {
  concurrency: number;
  perMinute: Record<Channel, number>;
  pollMs: number;
}

export interface DispatcherDeps {
  dataSource: DataSource;
  builder: MessageBuilder;
  triggers: TriggerService;
  logger: Logger;
  now: () => Date;
  options: DispatcherOptions;
}

type Outcome = { ok: true; result: SendResult } | { ok: false; error: SendError };

/**
 * Sends the outbox. Each row is claimed in a transaction (queued → sending, attempt row "started")
 * before the send and settled in another after it, so every try is on record. One p-queue per
 * channel holds the concurrency and the per-minute rate. A row left "sending" by a crash is resumed
 * at start-up and sent again with the same idempotency key, which is what lets the receiving side
 * drop the repeat where it can (see the README for what each channel guarantees).
 */
export class NotificationDispatcher {
  private readonly queues: Record<Channel, PQueue>;
  private readonly inFlight = new Set<number>();
  private transports: Transports | null = null;
  private timer: NodeJS.Timeout | null = null;
  private kickTimer: NodeJS.Timeout | null = null;
  private stopped = false;

  constructor(private readonly deps: DispatcherDeps) {
    const { options } = deps;
    const queue = (channel: Channel) => new PQueue({ concurrency: options.concurrency, intervalCap: options.perMinute[channel], interval: 60_000 });
    this.queues = { email: queue("email"), sms: queue("sms") };
  }

  /** Resumes what a crash interrupted, then polls for due rows. */
  async start(transports: Transports): Promise<number> {
    this.transports = transports;
    this.stopped = false;
    const resumed = await this.resumeInterrupted();
    this.timer = setInterval(() => this.kick(), this.deps.options.pollMs);
    this.timer.unref();
    this.kick();
    return resumed;
  }

  /** Rows left "sending" go back to the queue; their unfinished attempt is marked interrupted. */
  async resumeInterrupted(): Promise<number> {
    return writeTransaction(this.deps.dataSource, async (m) => {
      const now = this.deps.now().toISOString();
      const stuck = await m.getRepository(NotificationEntity).find({ where: { state: "sending" } });
      if (stuck.length === 0) return 0;
      const ids = stuck.map((r) => r.id);
      await m.getRepository(DeliveryAttemptEntity).update({ notificationId: In(ids), outcome: "started" }, { outcome: "interrupted", finishedAt: now, error: "The process stopped during this attempt; resumed at start-up." });
      await m.getRepository(NotificationEntity).update({ id: In(ids) }, { state: "queued", nextAttemptAt: now, updatedAt: now });
      await appendAudit(m, SYSTEM_ACTOR, { action: "notification.resumed", targetType: "notification", targetId: null, after: { ids } }, this.deps.now());
      return ids.length;
    });
  }

  /** Looks for due rows soon (debounced), e.g. right after new rows were queued. */
  kick(): void {
    if (this.stopped || !this.transports || this.kickTimer) return;
    this.kickTimer = setTimeout(() => {
      this.kickTimer = null;
      void this.enqueueDue().catch((err) => this.deps.logger.error({ err }, "outbox poll failed"));
    }, 20);
  }

  /** Puts every due row not already in hand on its channel's queue; returns how many. */
  async enqueueDue(): Promise<number> {
    if (this.stopped || !this.transports) return 0;
    const due = await this.deps.dataSource.getRepository(NotificationEntity).find({
      where: { state: "queued", nextAttemptAt: LessThanOrEqual(this.deps.now().toISOString()) },
      order: { nextAttemptAt: "ASC", id: "ASC" },
      take: 500,
    });
    let added = 0;
    for (const row of due) {
      if (this.inFlight.has(row.id)) continue;
      this.inFlight.add(row.id);
      added++;
      void this.queues[row.channel]
        .add(() => this.process(row.id))
        .catch((err) => this.deps.logger.error({ err, notificationId: row.id }, "notification dispatch failed"))
        .finally(() => this.inFlight.delete(row.id));
    }
    return added;
  }

  /** Waits until nothing is queued or being sent (retries included), or the time is up. For tests and shutdown. */
  async settle(timeoutMs = 30_000): Promise<boolean> {
    const deadline = Date.now() + timeoutMs;
    for (;;) {
      await this.enqueueDue();
      await Promise.all([this.queues.email.onIdle(), this.queues.sms.onIdle()]);
      const open = await this.deps.dataSource.getRepository(NotificationEntity).count({ where: { state: In(["queued", "sending"]) } });
      if (open === 0 && this.inFlight.size === 0) return true;
      if (Date.now() > deadline) return false;
      await new Promise((resolve) => setTimeout(resolve, 10));
    }
  }

  async stop(): Promise<void> {
    this.stopped = true;
    if (this.timer) clearInterval(this.timer);
    if (this.kickTimer) clearTimeout(this.kickTimer);
    this.timer = this.kickTimer = null;
    for (const queue of Object.values(this.queues)) queue.clear();
    await Promise.all(Object.values(this.queues).map((q) => q.onIdle()));
  }

  private async process(id: number): Promise<void> {
    const row = await this.claim(id);
    if (!row) return;
    const outcome = await this.send(row);
    await this.settleRow(row, outcome);
  }

  private async claim(id: number): Promise<NotificationEntity | null> {
    return writeTransaction(this.deps.dataSource, async (m) => {
      const repo = m.getRepository(NotificationEntity);
      const row = await repo.findOne({ where: { id, state: "queued" } });
      const now = this.deps.now().toISOString();
      if (!row || (row.nextAttemptAt && row.nextAttemptAt > now)) return null;
      row.state = "sending";
      row.attempts += 1;
      row.updatedAt = now;
      await repo.save(row);
      await m.getRepository(DeliveryAttemptEntity).save({ notificationId: row.id, attempt: row.attempts, outcome: "started", startedAt: now, finishedAt: null, providerMessageId: null, error: null });
      return row;
    });
  }

  private async send(row: NotificationEntity): Promise<Outcome> {
    const transports = this.transports;
    if (!transports) return { ok: false, error: new SendError("The dispatcher has no transports", true) };
    let message;
    try {
      message = row.channel === "email" ? await this.deps.builder.mail(row) : await this.deps.builder.sms(row);
    } catch (err) {
      // The trigger or its rule is gone: building again will not help.
      return { ok: false, error: new SendError(`Could not build the message: ${err instanceof Error ? err.message : String(err)}`, false) };
    }
    try {
      const result = row.channel === "email" ? await transports.mail.send(message as never) : await transports.sms.send(message as never);
      return { ok: true, result };
    } catch (err) {
      return { ok: false, error: err instanceof SendError ? err : new SendError(err instanceof Error ? err.message : String(err), true) };
    }
  }

  private async settleRow(claimed: NotificationEntity, outcome: Outcome): Promise<void> {
    const { options } = this.deps;
    await writeTransaction(this.deps.dataSource, async (m) => {
      const repo = m.getRepository(NotificationEntity);
      const row = await repo.findOneByOrFail({ id: claimed.id });
      const now = this.deps.now();
      const at = now.toISOString();
      const attempts = m.getRepository(DeliveryAttemptEntity);
      const who = `${CHANNEL_LABELS[row.channel]} to ${row.recipientName} (${row.address})`;
      if (outcome.ok) {
        Object.assign(row, { state: "sent", providerMessageId: outcome.result.providerMessageId, sentAt: at, lastError: null, nextAttemptAt: null, updatedAt: at });
        await repo.save(row);
        await attempts.update({ notificationId: row.id, attempt: row.attempts }, { outcome: "sent", finishedAt: at, providerMessageId: outcome.result.providerMessageId });
        await this.markTriggers(m, row, "notified", `${who} sent${row.attempts > 1 ? ` on attempt ${row.attempts}` : ""}.`);
        await appendAudit(m, SYSTEM_ACTOR, { action: "notification.sent", targetType: "notification", targetId: row.id, after: this.auditView(row) }, now);
        return;
      }
      const error = outcome.error.message.slice(0, 1000);
      // A manual resend starts a fresh round: count the tries since the last final failure.
      const lastFailure = await attempts.findOne({ where: { notificationId: row.id, outcome: "failed" }, order: { attempt: "DESC" } });
      const triesThisRound = row.attempts - (lastFailure?.attempt ?? 0);
      const retry = outcome.error.retryable && triesThisRound < options.maxAttempts;
      if (retry) {
        const next = new Date(now.getTime() + retryDelayMs(options, row.attempts)).toISOString();
        Object.assign(row, { state: "queued", nextAttemptAt: next, lastError: error, updatedAt: at });
        await repo.save(row);
        await attempts.update({ notificationId: row.id, attempt: row.attempts }, { outcome: "retry", finishedAt: at, error });
        return;
      }
      Object.assign(row, { state: "failed", nextAttemptAt: null, lastError: error, updatedAt: at });
      await repo.save(row);
      await attempts.update({ notificationId: row.id, attempt: row.attempts }, { outcome: "failed", finishedAt: at, error });
      const why = outcome.error.retryable ? `gave up after ${triesThisRound} attempt(s)` : "the failure is permanent";
      await this.markTriggers(m, row, "notify-failed", `${who} failed: ${why}. Last error: ${error}`);
      await appendAudit(m, SYSTEM_ACTOR, { action: "notification.failed", targetType: "notification", targetId: row.id, after: this.auditView(row) }, now);
    });
    if (!outcome.ok) this.deps.logger.warn({ notificationId: claimed.id, error: outcome.error.message }, "notification attempt failed");
  }

  /** Puts the outcome on every trigger the message is about, where the timeline and the trigger page show it. */
  private async markTriggers(m: EntityManager, row: NotificationEntity, kind: "notified" | "notify-failed", note: string): Promise<void> {
    const triggers = await m.getRepository(TriggerEntity).find({ where: { id: In(row.triggerIds) } });
    for (const trigger of triggers) {
      await this.deps.triggers.addEvent(m, trigger, kind, null, note, { notificationId: row.id, channel: row.channel, contactId: row.contactId, change: row.change, attempts: row.attempts, providerMessageId: row.providerMessageId });
    }
  }

  private auditView(row: NotificationEntity) {
    return { triggerIds: row.triggerIds, change: row.change, level: row.level, channel: row.channel, contactId: row.contactId, recipient: row.recipientName, address: row.address, attempts: row.attempts, state: row.state, providerMessageId: row.providerMessageId, lastError: row.lastError, idempotencyKey: row.idempotencyKey };
  }
}
