import "reflect-metadata";
import { Column, Entity, Index, PrimaryGeneratedColumn } from "typeorm";

/**
 * The outcome of one rule version for one zone on one frame. Unique on (version, zone, frame), so a
 * frame evaluated twice changes nothing.
 */
@Entity({ name: "rule_evaluations" })
@Index("idx_rule_evaluations_unique", ["ruleVersionId", "zoneId", "frameId"], { unique: true })
@Index("idx_rule_evaluations_run", ["ruleId", "zoneId", "runTime"])
export class RuleEvaluationEntity {
  @PrimaryGeneratedColumn({ type: "integer" })
  id!: number;

  @Column({ name: "rule_id", type: "integer" })
  ruleId!: number;

  @Column({ name: "rule_version_id", type: "integer" })
  ruleVersionId!: number;

  @Column({ name: "zone_id", type: "integer" })
  zoneId!: number;

  @Column({ name: "frame_id", type: "integer" })
  frameId!: number;

  @Column({ type: "varchar", length: 60 })
  model!: string;

  @Column({ name: "run_time", type: "varchar", length: 30 })
  runTime!: string;

  @Column({ name: "valid_time", type: "varchar", length: 30 })
  validTime!: string;

  /** Expression and spatial condition held in this frame (before persistence). */
  @Column({ type: "boolean" })
  met!: boolean;

  /** MatchSummary as JSON: points, coverage, field extremes over the matched points. */
  @Column({ type: "text" })
  summary!: string;

  @Column({ type: "varchar", length: 400 })
  reason!: string;

  @Column({ name: "trigger_id", type: "integer", nullable: true })
  triggerId!: number | null;

  @Column({ name: "evaluated_at", type: "varchar", length: 30 })
  evaluatedAt!: string;
}
