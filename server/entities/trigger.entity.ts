import "reflect-metadata";
import { Column, Entity, Index, PrimaryGeneratedColumn } from "typeorm";
import type { TriggerState } from "../../shared/api/triggers.ts";
import type { Severity } from "../../shared/rules/severity.ts";

/** A rule matched in a zone: one per rule, zone and event window. */
@Entity({ name: "triggers" })
@Index("idx_triggers_rule_zone_state", ["ruleId", "zoneId", "state"])
export class TriggerEntity {
  @PrimaryGeneratedColumn({ type: "integer" })
  id!: number;

  /** rule:zone:first valid time of the event — the same event can never open twice. */
  @Index("idx_triggers_key", { unique: true })
  @Column({ name: "trigger_key", type: "varchar", length: 120 })
  triggerKey!: string;

  @Column({ name: "rule_id", type: "integer" })
  ruleId!: number;

  /** The version that opened the trigger (later matching versions are recorded in its events). */
  @Column({ name: "rule_version_id", type: "integer" })
  ruleVersionId!: number;

  @Column({ name: "zone_id", type: "integer" })
  zoneId!: number;

  @Column({ type: "varchar", length: 12 })
  severity!: Severity;

  @Index("idx_triggers_state")
  @Column({ type: "varchar", length: 16 })
  state!: TriggerState;

  @Column({ type: "varchar", length: 60 })
  model!: string;

  /** The newest run that supports the trigger. */
  @Column({ name: "run_time", type: "varchar", length: 30 })
  runTime!: string;

  @Column({ name: "first_valid_time", type: "varchar", length: 30 })
  firstValidTime!: string;

  @Column({ name: "last_valid_time", type: "varchar", length: 30 })
  lastValidTime!: string;

  /** Valid times the newest run still matches, as a JSON array; empty means cleared. */
  @Column({ name: "matched_valid_times", type: "text" })
  matchedValidTimes!: string;

  /** Largest values seen so far, as JSON: { coverage, matchedPoints, fields: { key: max } }. */
  @Column({ type: "text" })
  peak!: string;

  @Index("idx_triggers_opened_at")
  @Column({ name: "opened_at", type: "varchar", length: 30 })
  openedAt!: string;

  @Column({ name: "updated_at", type: "varchar", length: 30 })
  updatedAt!: string;

  @Column({ name: "acknowledged_by", type: "varchar", length: 64, nullable: true })
  acknowledgedBy!: string | null;

  @Column({ name: "acknowledged_at", type: "varchar", length: 30, nullable: true })
  acknowledgedAt!: string | null;

  @Column({ name: "closed_at", type: "varchar", length: 30, nullable: true })
  closedAt!: string | null;

  @Column({ name: "closed_by", type: "varchar", length: 64, nullable: true })
  closedBy!: string | null;

  @Column({ name: "close_reason", type: "varchar", length: 500, nullable: true })
  closeReason!: string | null;
}
