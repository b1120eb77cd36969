import "reflect-metadata";
import { Column, Entity, Index, PrimaryGeneratedColumn } from "typeorm";

/** Someone Bellwether can notify: office staff (optionally linked to an account) or an outside partner. */
@Entity({ name: "contacts" })
export class ContactEntity {
  @PrimaryGeneratedColumn({ type: "integer" })
  id!: number;

  @Column({ type: "varchar", length: 120 })
  name!: string;

  @Column({ type: "varchar", length: 120, default: "" })
  organisation!: string;

  @Column({ type: "varchar", length: 254, nullable: true })
  email!: string | null;

  /** E.164, e.g. +15550100123. */
  @Column({ type: "varchar", length: 16, nullable: true })
  mobile!: string | null;

  /** Preferred channels as a JSON array ("email", "sms"). */
  @Column({ type: "simple-json" })
  channels!: Array<"email" | "sms">;

  /** Quiet hours as JSON {start, end, timeZone}, or null for none. */
  @Column({ name: "quiet_hours", type: "simple-json", nullable: true })
  quietHours!: { start: string; end: string; timeZone: string } | null;

  @Index("idx_contacts_user")
  @Column({ name: "user_id", type: "integer", nullable: true })
  userId!: number | null;

  @Column({ type: "boolean", default: true })
  active!: boolean;

  @Column({ name: "created_at", type: "varchar", length: 30 })
  createdAt!: string;

  @Column({ name: "updated_at", type: "varchar", length: 30 })
  updatedAt!: string;
}
