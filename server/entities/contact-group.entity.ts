import "reflect-metadata";
import { Column, Entity, Index, PrimaryGeneratedColumn } from "typeorm";

/** A named set of contacts that rules can address at once (e.g. the office's partners). */
@Entity({ name: "contact_groups" })
export class ContactGroupEntity {
  @PrimaryGeneratedColumn({ type: "integer" })
  id!: number;

  @Index("idx_contact_groups_name", { unique: true })
  @Column({ type: "varchar", length: 120 })
  name!: string;

  @Column({ type: "varchar", length: 500, default: "" })
  description!: string;

  @Column({ name: "created_at", type: "varchar", length: 30 })
  createdAt!: string;

  @Column({ name: "updated_at", type: "varchar", length: 30 })
  updatedAt!: string;
}
