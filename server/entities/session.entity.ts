import "reflect-metadata";
import { Column, DeleteDateColumn, Entity, Index, PrimaryColumn } from "typeorm";
import type { ISession } from "connect-typeorm";

/** Express sessions, stored in SQLite through connect-typeorm (never in memory). */
@Entity({ name: "sessions" })
export class SessionEntity implements ISession {
  @PrimaryColumn({ type: "varchar", length: 255 })
  id!: string;

  @Index("idx_sessions_expired_at")
  @Column({ name: "expired_at", type: "bigint" })
  expiredAt: number = Date.now();

  @Column({ type: "text" })
  json: string = "";

  @DeleteDateColumn({ name: "destroyed_at", type: "datetime", nullable: true })
  destroyedAt?: Date;
}
