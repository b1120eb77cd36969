import "reflect-metadata";
import { Column, Entity, Index, PrimaryGeneratedColumn } from "typeorm";
import type { ShiftRole } from "../../shared/api/notifications.ts";

/** Who is on duty from when to when (UTC), and in which role; rules address "whoever is on shift". */
@Entity({ name: "on_call_shifts" })
@Index("idx_on_call_shifts_span", ["startsAt", "endsAt"])
export class OnCallShiftEntity {
  @PrimaryGeneratedColumn({ type: "integer" })
  id!: number;

  @Index("idx_on_call_shifts_contact")
  @Column({ name: "contact_id", type: "integer" })
  contactId!: number;

  @Column({ type: "varchar", length: 16 })
  role!: ShiftRole;

  /** ISO UTC, inclusive. */
  @Column({ name: "starts_at", type: "varchar", length: 30 })
  startsAt!: string;

  /** ISO UTC, exclusive. */
  @Column({ name: "ends_at", type: "varchar", length: 30 })
  endsAt!: string;

  @Column({ type: "varchar", length: 200, default: "" })
  note!: string;
}
