import "reflect-metadata";
import { Column, Entity, Index, PrimaryGeneratedColumn } from "typeorm";
import type { Channel, NotificationState, NotifyChange } from "../../shared/api/notifications.ts";
import type { Severity } from "../../shared/rules/severity.ts";

/**
 * One message to one recipient over one channel: the outbox row. Written in the transaction that
 * changes the trigger; the dispatcher moves it queued → sending → sent (or back to queued to retry,
 * or to failed). The idempotency key makes the same change to the same person on the same channel
 * impossible to write twice, and travels with the send so the receiving side can drop repeats.
 */
@Entity({ name: "notifications" })
@Index("idx_notifications_due", ["state", "nextAttemptAt"])
export class NotificationEntity {
  @PrimaryGeneratedColumn({ type: "integer" })
  id!: number;

  /** Null for a digest, which lists its triggers in `triggerIds`. */
  @Index("idx_notifications_trigger")
  @Column({ name: "trigger_id", type: "integer", nullable: true })
  triggerId!: number | null;

  /** JSON array of the trigger ids the message is about. */
  @Column({ name: "trigger_ids", type: "simple-json" })
  triggerIds!: number[];

  @Column({ type: "varchar", length: 16 })
  change!: NotifyChange;

  /** Escalation level (1, 2), null otherwise. */
  @Column({ type: "integer", nullable: true })
  level!: number | null;

  @Column({ type: "varchar", length: 8 })
  channel!: Channel;

  @Column({ name: "contact_id", type: "integer", nullable: true })
  contactId!: number | null;

  /** Name and address as they were when the row was written. */
  @Column({ name: "recipient_name", type: "varchar", length: 120 })
  recipientName!: string;

  @Column({ type: "varchar", length: 254 })
  address!: string;

  /** Which message body to build: one trigger, or a digest. */
  @Column({ type: "varchar", length: 16 })
  template!: "trigger" | "digest";

  @Column({ type: "varchar", length: 12 })
  severity!: Severity;

  @Index("idx_notifications_key", { unique: true })
  @Column({ name: "idempotency_key", type: "varchar", length: 160 })
  idempotencyKey!: string;

  @Column({ type: "varchar", length: 12 })
  state!: NotificationState;

  @Column({ type: "integer", default: 0 })
  attempts!: number;

  @Column({ name: "next_attempt_at", type: "varchar", length: 30, nullable: true })
  nextAttemptAt!: string | null;

  /** End of the contact's quiet hours, for a held row. */
  @Column({ name: "held_until", type: "varchar", length: 30, nullable: true })
  heldUntil!: string | null;

  /** The digest row that carried this held row. */
  @Column({ name: "digest_id", type: "integer", nullable: true })
  digestId!: number | null;

  @Column({ name: "provider_message_id", type: "varchar", length: 200, nullable: true })
  providerMessageId!: string | null;

  @Column({ name: "last_error", type: "varchar", length: 1000, nullable: true })
  lastError!: string | null;

  @Column({ name: "created_at", type: "varchar", length: 30 })
  createdAt!: string;

  @Column({ name: "updated_at", type: "varchar", length: 30 })
  updatedAt!: string;

  @Column({ name: "sent_at", type: "varchar", length: 30, nullable: true })
  sentAt!: string | null;
}
