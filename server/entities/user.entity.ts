import "reflect-metadata";
import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from "typeorm";
import type { Role } from "../../shared/auth/permissions.ts";

@Entity({ name: "users" })
export class UserEntity {
  @PrimaryGeneratedColumn({ type: "integer" })
  id!: number;

  @Index("idx_users_username", { unique: true })
  @Column({ type: "varchar", length: 64 })
  username!: string;

  @Column({ name: "display_name", type: "varchar", length: 120 })
  displayName!: string;

  @Column({ name: "password_hash", type: "varchar", length: 100 })
  passwordHash!: string;

  /** Roles as a JSON array; an account may hold several. */
  @Column({ type: "simple-json" })
  roles!: Role[];

  @Column({ type: "boolean", default: false })
  disabled!: boolean;

  @CreateDateColumn({ name: "created_at", type: "datetime" })
  createdAt!: Date;

  @Column({ name: "last_login_at", type: "datetime", nullable: true })
  lastLoginAt!: Date | null;
}
