import "reflect-metadata";
import { Column, Entity, Index, PrimaryGeneratedColumn } from "typeorm";
import type { TriggerEventKind } from "../../shared/api/triggers.ts";

/** Everything that happened to a trigger, in order, with who and when. */
@Entity({ name: "trigger_events" })
export class TriggerEventEntity {
  @PrimaryGeneratedColumn({ type: "integer" })
  id!: number;

  @Index("idx_trigger_events_trigger")
  @Column({ name: "trigger_id", type: "integer" })
  triggerId!: number;

  @Column({ type: "varchar", length: 24 })
  kind!: TriggerEventKind;

  @Index("idx_trigger_events_at")
  @Column({ type: "varchar", length: 30 })
  at!: string;

  /** Username, or null for the system. */
  @Column({ type: "varchar", length: 64, nullable: true })
  actor!: string | null;

  @Column({ type: "varchar", length: 2000, nullable: true })
  note!: string | null;

  @Column({ type: "text", nullable: true })
  data!: string | null;
}
