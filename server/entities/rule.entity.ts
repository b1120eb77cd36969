import "reflect-metadata";
import { Column, Entity, PrimaryGeneratedColumn } from "typeorm";

/** A lead's rule; its content lives in immutable RuleVersion rows, the newest named here. */
@Entity({ name: "rules" })
export class RuleEntity {
  @PrimaryGeneratedColumn({ type: "integer" })
  id!: number;

  @Column({ type: "varchar", length: 120 })
  name!: string;

  @Column({ type: "boolean", default: true })
  enabled!: boolean;

  @Column({ name: "current_version_id", type: "integer", nullable: true })
  currentVersionId!: number | null;

  @Column({ type: "boolean", default: false })
  archived!: boolean;

  @Column({ name: "created_by", type: "varchar", length: 64, nullable: true })
  createdBy!: string | null;

  @Column({ name: "created_at", type: "varchar", length: 30 })
  createdAt!: string;

  @Column({ name: "updated_at", type: "varchar", length: 30 })
  updatedAt!: string;
}
