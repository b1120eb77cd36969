import "reflect-metadata";
import { Column, Entity, Index, PrimaryGeneratedColumn } from "typeorm";
import type { AttemptOutcome } from "../../shared/api/notifications.ts";

/** One try at sending a notification: written as "started" before the send, finished after it. */
@Entity({ name: "delivery_attempts" })
@Index("idx_delivery_attempts_notification", ["notificationId", "attempt"], { unique: true })
export class DeliveryAttemptEntity {
  @PrimaryGeneratedColumn({ type: "integer" })
  id!: number;

  @Column({ name: "notification_id", type: "integer" })
  notificationId!: number;

  @Column({ type: "integer" })
  attempt!: number;

  @Column({ type: "varchar", length: 12 })
  outcome!: AttemptOutcome;

  @Column({ name: "started_at", type: "varchar", length: 30 })
  startedAt!: string;

  @Column({ name: "finished_at", type: "varchar", length: 30, nullable: true })
  finishedAt!: string | null;

  @Column({ name: "provider_message_id", type: "varchar", length: 200, nullable: true })
  providerMessageId!: string | null;

  @Column({ type: "varchar", length: 1000, nullable: true })
  error!: string | null;
}
