import type { EntityManager } from "typeorm";
import type { Channel } from "../../shared/api/notifications.ts";
import { isInQuietHours, quietHoursEnd } from "../../shared/notify/quiet-hours.ts";
import type { ContactEntity } from "../entities/contact.entity.ts";
import { NotificationEntity } from "../entities/notification.entity.ts";
import type { TriggerEntity } from "../entities/trigger.entity.ts";
import { appendAudit, SYSTEM_ACTOR } from "../audit/audit-log.ts";
import type { TriggerService } from "../services/trigger.service.ts";
import type { NotifiableChange, TriggerNotifier } from "../services/trigger-notifier.ts";
import type { RecipientResolver, Recipients } from "./recipients.ts";

/**
 * The change part of an idempotency key. A severity rise names the new severity, so a later rise to
 * the next step is news again; an escalation names its level.
 */
function changeKey(trigger: TriggerEntity, change: NotifiableChange, level: number | null): string {
  if (change === "severity-rose") return `rose-${trigger.severity}`;
  if (change === "escalated") return `escalated-${level ?? 1}`;
  return "opened";
}

/** One key per (trigger, change, recipient, channel): the same change never makes two rows. */
export function idempotencyKey(triggerId: number, change: string, contactId: number, channel: Channel): string {
  return `t${triggerId}.${change}.c${contactId}.${channel}`;
}

export function addressFor(contact: ContactEntity, channel: Channel): string | null {
  return channel === "email" ? contact.email : contact.mobile;
}

/**
 * Writes the outbox rows for a trigger change inside the transaction that makes the change, so a
 * crash can lose neither. Low-severity messages to someone in quiet hours are held for the digest;
 * escalations and serious or urgent triggers always go out. A change that reaches nobody is marked
 * on the trigger at once ("notify-failed"), never silently dropped.
 */
export class OutboxNotifier implements TriggerNotifier {
  constructor(
    private readonly deps: {
      recipients: RecipientResolver;
      triggers: TriggerService;
      now: () => Date;
      /** Called after rows are written, so the dispatcher looks soon rather than at its next poll. */
      onQueued?: () => void;
    },
  ) {}

  async onTriggerChange(m: EntityManager, trigger: TriggerEntity, change: NotifiableChange, detail?: { level?: number; note?: string }): Promise<void> {
    const now = this.deps.now();
    const level = change === "escalated" ? (detail?.level ?? 1) : null;
    const recipients: Recipients = change === "escalated" ? await this.deps.recipients.forEscalation(m, level!, now) : await this.deps.recipients.forRule(m, trigger, now);
    const rows = m.getRepository(NotificationEntity);
    const key = changeKey(trigger, change, level);
    let queued = 0;
    let held = 0;
    let already = 0;
    const missingAddress: string[] = [];
    for (const contact of recipients.contacts) {
      const channels = contact.channels.filter((channel) => addressFor(contact, channel));
      if (channels.length === 0) missingAddress.push(contact.name);
      const quietUntil = change !== "escalated" && trigger.severity === "heads-up" && contact.quietHours && isInQuietHours(contact.quietHours, now) ? quietHoursEnd(contact.quietHours, now) : null;
      for (const channel of channels) {
        const idempotency = idempotencyKey(trigger.id, key, contact.id, channel);
        if (await rows.exists({ where: { idempotencyKey: idempotency } })) {
          already++;
          continue;
        }
        await rows.save(
          rows.create({
            triggerId: trigger.id,
            triggerIds: [trigger.id],
            change,
            level,
            channel,
            contactId: contact.id,
            recipientName: contact.name,
            address: addressFor(contact, channel)!,
            template: "trigger",
            severity: trigger.severity,
            idempotencyKey: idempotency,
            state: quietUntil ? "held" : "queued",
            attempts: 0,
            nextAttemptAt: quietUntil ? null : now.toISOString(),
            heldUntil: quietUntil ? quietUntil.toISOString() : null,
            digestId: null,
            providerMessageId: null,
            lastError: null,
            createdAt: now.toISOString(),
            updatedAt: now.toISOString(),
            sentAt: null,
          }),
        );
        if (quietUntil) held++;
        else queued++;
      }
    }
    // The same change seen again (a re-run) writes nothing and is not news.
    if (already > 0 && queued + held === 0) return;
    if (queued + held === 0) {
      const why = recipients.contacts.length === 0 ? `nobody to notify (${recipients.explanation || "the rule names no recipients"})` : `no usable address for ${missingAddress.join(", ")}`;
      await this.deps.triggers.addEvent(m, trigger, "notify-failed", null, `No message was queued for this ${change}: ${why}.`, { change, level });
      await appendAudit(m, SYSTEM_ACTOR, { action: "notification.no_recipients", targetType: "trigger", targetId: trigger.id, after: { change, level, why } }, now);
      return;
    }
    await appendAudit(m, SYSTEM_ACTOR, { action: "notification.queued", targetType: "trigger", targetId: trigger.id, after: { change, level, queued, held, recipients: recipients.explanation } }, now);
    this.deps.onQueued?.();
  }
}
