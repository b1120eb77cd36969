import "reflect-metadata";
import { Column, Entity, PrimaryColumn } from "typeorm";

/** One office notification setting (a template or the escalation contact), stored as JSON; defaults apply when absent. */
@Entity({ name: "notify_settings" })
export class NotifySettingEntity {
  @PrimaryColumn({ type: "varchar", length: 40 })
  key!: string;

  @Column({ type: "text" })
  value!: string;

  @Column({ name: "updated_at", type: "varchar", length: 30 })
  updatedAt!: string;

  @Column({ name: "updated_by", type: "varchar", length: 64, nullable: true })
  updatedBy!: string | null;
}
