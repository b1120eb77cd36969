import "reflect-metadata";
import { Column, Entity, Index, PrimaryGeneratedColumn } from "typeorm";

/** One saved state of a rule. Never updated: every edit appends a new version. */
@Entity({ name: "rule_versions" })
@Index("idx_rule_versions_rule_version", ["ruleId", "version"], { unique: true })
export class RuleVersionEntity {
  @PrimaryGeneratedColumn({ type: "integer" })
  id!: number;

  @Column({ name: "rule_id", type: "integer" })
  ruleId!: number;

  @Column({ type: "integer" })
  version!: number;

  /** The RuleDefinition as JSON (shared/api/rules.ts). */
  @Column({ type: "text" })
  definition!: string;

  @Column({ name: "created_by", type: "varchar", length: 64, nullable: true })
  createdBy!: string | null;

  @Column({ name: "created_at", type: "varchar", length: 30 })
  createdAt!: string;

  @Column({ name: "change_note", type: "varchar", length: 500 })
  changeNote!: string;
}
