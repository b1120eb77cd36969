import "reflect-metadata";
import { Column, Entity, Index, PrimaryGeneratedColumn } from "typeorm";

/**
 * Append-only audit trail. Each row carries a SHA-256 hash over its own content and the
 * previous row's hash, so editing or deleting any row breaks the chain from that row on.
 */
@Entity({ name: "audit_entries" })
export class AuditEntryEntity {
  @PrimaryGeneratedColumn({ type: "integer" })
  id!: number;

  /** ISO-8601 UTC time, stored as text so the hashed form is exactly what is stored. */
  @Index("idx_audit_at")
  @Column({ type: "varchar", length: 30 })
  at!: string;

  @Index("idx_audit_actor")
  @Column({ type: "varchar", length: 64, nullable: true })
  actor!: string | null;

  @Column({ name: "actor_roles", type: "text" })
  actorRoles!: string;

  @Index("idx_audit_action")
  @Column({ type: "varchar", length: 80 })
  action!: string;

  @Column({ name: "target_type", type: "varchar", length: 80 })
  targetType!: string;

  @Column({ name: "target_id", type: "varchar", length: 120, nullable: true })
  targetId!: string | null;

  @Column({ name: "before_json", type: "text", nullable: true })
  beforeJson!: string | null;

  @Column({ name: "after_json", type: "text", nullable: true })
  afterJson!: string | null;

  @Column({ name: "request_id", type: "varchar", length: 64, nullable: true })
  requestId!: string | null;

  @Column({ name: "prev_hash", type: "varchar", length: 64 })
  prevHash!: string;

  @Column({ type: "varchar", length: 64 })
  hash!: string;
}
