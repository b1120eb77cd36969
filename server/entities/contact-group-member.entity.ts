import "reflect-metadata";
import { Entity, Index, PrimaryColumn } from "typeorm";

/** One contact's membership of one group. */
@Entity({ name: "contact_group_members" })
@Index("idx_contact_group_members_contact", ["contactId"])
export class ContactGroupMemberEntity {
  @PrimaryColumn({ name: "group_id", type: "integer" })
  groupId!: number;

  @PrimaryColumn({ name: "contact_id", type: "integer" })
  contactId!: number;
}
