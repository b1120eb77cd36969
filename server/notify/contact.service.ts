import type { DataSource, EntityManager } from "typeorm";
import { In, MoreThan } from "typeorm";
import type { ContactDto, ContactValues, GroupDto, GroupValues } from "../../shared/api/notifications.ts";
import type { RuleDefinition } from "../../shared/api/rules.ts";
import { ContactEntity } from "../entities/contact.entity.ts";
import { ContactGroupEntity } from "../entities/contact-group.entity.ts";
import { ContactGroupMemberEntity } from "../entities/contact-group-member.entity.ts";
import { OnCallShiftEntity } from "../entities/on-call-shift.entity.ts";
import { RuleEntity } from "../entities/rule.entity.ts";
import { RuleVersionEntity } from "../entities/rule-version.entity.ts";
import { UserEntity } from "../entities/user.entity.ts";
import { appendAudit, type AuditActor } from "../audit/audit-log.ts";
import { writeTransaction } from "../db/data-source.ts";
import { ConflictError, NotFoundError, ValidationError } from "../errors.ts";
import type { NotifySettingsService } from "./notify-settings.service.ts";

/** What the audit trail keeps of a contact. */
const contactAuditView = (c: ContactEntity) => ({ name: c.name, organisation: c.organisation, email: c.email, mobile: c.mobile, channels: c.channels, quietHours: c.quietHours, userId: c.userId, active: c.active });

/** Contacts and contact groups: who can be told, and how. */
export class ContactService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly settings: NotifySettingsService,
    private readonly now: () => Date = () => new Date(),
  ) {}

  async listContacts(): Promise<ContactDto[]> {
    const contacts = await this.dataSource.getRepository(ContactEntity).find({ order: { name: "ASC" } });
    return this.toContactDtos(this.dataSource.manager, contacts);
  }

  async getContact(id: number): Promise<ContactDto> {
    const [dto] = await this.toContactDtos(this.dataSource.manager, [await this.findContact(this.dataSource.manager, id)]);
    return dto!;
  }

  async createContact(actor: AuditActor, input: ContactValues): Promise<ContactDto> {
    const id = await writeTransaction(this.dataSource, async (m) => {
      await this.assertUserLinkFree(m, input.userId, null);
      const at = this.now().toISOString();
      const contact = await m.getRepository(ContactEntity).save(m.getRepository(ContactEntity).create({ ...input, createdAt: at, updatedAt: at }));
      await appendAudit(m, actor, { action: "contact.created", targetType: "contact", targetId: contact.id, after: contactAuditView(contact) }, this.now());
      return contact.id;
    });
    return this.getContact(id);
  }

  async updateContact(actor: AuditActor, id: number, input: ContactValues): Promise<ContactDto> {
    await writeTransaction(this.dataSource, async (m) => {
      const contact = await this.findContact(m, id);
      await this.assertUserLinkFree(m, input.userId, id);
      const before = contactAuditView(contact);
      Object.assign(contact, input, { updatedAt: this.now().toISOString() });
      await m.getRepository(ContactEntity).save(contact);
      await appendAudit(m, actor, { action: "contact.updated", targetType: "contact", targetId: id, before, after: contactAuditView(contact) }, this.now());
    });
    return this.getContact(id);
  }

  /** Removes a contact nothing depends on any more; otherwise says what still uses it. */
  async deleteContact(actor: AuditActor, id: number): Promise<void> {
    await writeTransaction(this.dataSource, async (m) => {
      const contact = await this.findContact(m, id);
      const uses: string[] = [];
      const shifts = await m.getRepository(OnCallShiftEntity).count({ where: { contactId: id, endsAt: MoreThan(this.now().toISOString()) } });
      if (shifts > 0) uses.push(`${shifts} current or future on-call shift(s)`);
      const rules = await this.rulesUsing(m, (r) => r.contactIds.includes(id));
      if (rules.length > 0) uses.push(`the recipients of ${rules.map((n) => `"${n}"`).join(", ")}`);
      if ((await this.settings.get()).escalationContactId === id) uses.push("the office's last escalation level");
      if (uses.length > 0) throw new ConflictError(`${contact.name} is still used by ${uses.join("; ")}. Change those first, or mark the contact inactive.`);
      await m.getRepository(ContactGroupMemberEntity).delete({ contactId: id });
      await m.getRepository(OnCallShiftEntity).delete({ contactId: id });
      await m.getRepository(ContactEntity).delete({ id });
      await appendAudit(m, actor, { action: "contact.deleted", targetType: "contact", targetId: id, before: contactAuditView(contact) }, this.now());
    });
  }

  async listGroups(): Promise<GroupDto[]> {
    const groups = await this.dataSource.getRepository(ContactGroupEntity).find({ order: { name: "ASC" } });
    const members = await this.dataSource.getRepository(ContactGroupMemberEntity).find();
    return groups.map((g) => this.toGroupDto(g, members));
  }

  async getGroup(id: number): Promise<GroupDto> {
    const group = await this.findGroup(this.dataSource.manager, id);
    const members = await this.dataSource.getRepository(ContactGroupMemberEntity).find({ where: { groupId: id } });
    return this.toGroupDto(group, members);
  }

  async createGroup(actor: AuditActor, input: GroupValues): Promise<GroupDto> {
    const id = await writeTransaction(this.dataSource, async (m) => {
      await this.assertGroupNameFree(m, input.name, null);
      await this.assertContactsExist(m, input.contactIds);
      const at = this.now().toISOString();
      const group = await m.getRepository(ContactGroupEntity).save({ name: input.name, description: input.description, createdAt: at, updatedAt: at });
      await m.getRepository(ContactGroupMemberEntity).save(input.contactIds.map((contactId) => ({ groupId: group.id, contactId })));
      await appendAudit(m, actor, { action: "contact_group.created", targetType: "contact_group", targetId: group.id, after: input }, this.now());
      return group.id;
    });
    return this.getGroup(id);
  }

  async updateGroup(actor: AuditActor, id: number, input: GroupValues): Promise<GroupDto> {
    await writeTransaction(this.dataSource, async (m) => {
      const group = await this.findGroup(m, id);
      await this.assertGroupNameFree(m, input.name, id);
      await this.assertContactsExist(m, input.contactIds);
      const before = { name: group.name, description: group.description, contactIds: (await m.getRepository(ContactGroupMemberEntity).find({ where: { groupId: id } })).map((r) => r.contactId) };
      await m.getRepository(ContactGroupEntity).update({ id }, { name: input.name, description: input.description, updatedAt: this.now().toISOString() });
      await m.getRepository(ContactGroupMemberEntity).delete({ groupId: id });
      await m.getRepository(ContactGroupMemberEntity).save(input.contactIds.map((contactId) => ({ groupId: id, contactId })));
      await appendAudit(m, actor, { action: "contact_group.updated", targetType: "contact_group", targetId: id, before, after: input }, this.now());
    });
    return this.getGroup(id);
  }

  async deleteGroup(actor: AuditActor, id: number): Promise<void> {
    await writeTransaction(this.dataSource, async (m) => {
      const group = await this.findGroup(m, id);
      const rules = await this.rulesUsing(m, (r) => r.groupIds.includes(id));
      if (rules.length > 0) throw new ConflictError(`The group "${group.name}" is still a recipient of ${rules.map((n) => `"${n}"`).join(", ")}. Change those rules first.`);
      await m.getRepository(ContactGroupMemberEntity).delete({ groupId: id });
      await m.getRepository(ContactGroupEntity).delete({ id });
      await appendAudit(m, actor, { action: "contact_group.deleted", targetType: "contact_group", targetId: id, before: { name: group.name } }, this.now());
    });
  }

  /** Contacts that exist, by id (missing ids are left out). */
  async contactsByIds(m: EntityManager, ids: readonly number[]): Promise<ContactEntity[]> {
    if (ids.length === 0) return [];
    return m.getRepository(ContactEntity).find({ where: { id: In([...ids]) } });
  }

  /** Every member of the given groups. */
  async groupMembers(m: EntityManager, groupIds: readonly number[]): Promise<ContactEntity[]> {
    if (groupIds.length === 0) return [];
    const rows = await m.getRepository(ContactGroupMemberEntity).find({ where: { groupId: In([...groupIds]) } });
    return this.contactsByIds(m, [...new Set(rows.map((r) => r.contactId))]);
  }

  /** Checks that ids name existing contacts and groups (rules and settings call this before saving). */
  async assertRecipientsExist(contactIds: readonly number[], groupIds: readonly number[] = []): Promise<void> {
    await this.assertContactsExist(this.dataSource.manager, contactIds);
    const found = groupIds.length ? await this.dataSource.getRepository(ContactGroupEntity).find({ where: { id: In([...groupIds]) } }) : [];
    const missing = groupIds.filter((id) => !found.some((g) => g.id === id));
    if (missing.length) throw new ValidationError(`No contact group with id ${missing.join(", ")}.`);
  }

  private async assertContactsExist(m: EntityManager, ids: readonly number[]): Promise<void> {
    const found = await this.contactsByIds(m, ids);
    const missing = ids.filter((id) => !found.some((c) => c.id === id));
    if (missing.length) throw new ValidationError(`No contact with id ${missing.join(", ")}.`, { issues: [{ field: "contactIds", message: `Unknown contact id ${missing.join(", ")}` }] });
  }

  private async assertUserLinkFree(m: EntityManager, userId: number | null, contactId: number | null): Promise<void> {
    if (userId === null) return;
    if (!(await m.getRepository(UserEntity).exists({ where: { id: userId } }))) {
      throw new ValidationError(`No account with id ${userId}.`, { issues: [{ field: "userId", message: "Pick an existing account" }] });
    }
    const other = await m.getRepository(ContactEntity).findOne({ where: { userId } });
    if (other && other.id !== contactId) throw new ConflictError(`That account is already linked to the contact "${other.name}".`);
  }

  private async assertGroupNameFree(m: EntityManager, name: string, groupId: number | null): Promise<void> {
    const other = await m.getRepository(ContactGroupEntity).findOne({ where: { name } });
    if (other && other.id !== groupId) throw new ConflictError(`A group called "${name}" already exists.`, { issues: [{ field: "name", message: "This name is taken" }] });
  }

  /** Names of enabled rules whose current version's recipients match. */
  private async rulesUsing(m: EntityManager, match: (r: RuleDefinition["recipients"]) => boolean): Promise<string[]> {
    const rules = await m.getRepository(RuleEntity).find({ where: { archived: false } });
    const versionIds = rules.map((r) => r.currentVersionId).filter((id): id is number => id !== null);
    const versions = versionIds.length ? await m.getRepository(RuleVersionEntity).find({ where: { id: In(versionIds) } }) : [];
    return versions.filter((v) => match((JSON.parse(v.definition) as RuleDefinition).recipients)).map((v) => rules.find((r) => r.currentVersionId === v.id)!.name);
  }

  private async findContact(m: EntityManager, id: number): Promise<ContactEntity> {
    const contact = await m.getRepository(ContactEntity).findOne({ where: { id } });
    if (!contact) throw new NotFoundError(`Contact ${id}`);
    return contact;
  }

  private async findGroup(m: EntityManager, id: number): Promise<ContactGroupEntity> {
    const group = await m.getRepository(ContactGroupEntity).findOne({ where: { id } });
    if (!group) throw new NotFoundError(`Contact group ${id}`);
    return group;
  }

  private async toContactDtos(m: EntityManager, contacts: ContactEntity[]): Promise<ContactDto[]> {
    const members = contacts.length ? await m.getRepository(ContactGroupMemberEntity).find({ where: { contactId: In(contacts.map((c) => c.id)) } }) : [];
    const userIds = contacts.map((c) => c.userId).filter((id): id is number => id !== null);
    const users = userIds.length ? await m.getRepository(UserEntity).find({ where: { id: In(userIds) } }) : [];
    return contacts.map((c) => ({
      id: c.id,
      name: c.name,
      organisation: c.organisation,
      email: c.email,
      mobile: c.mobile,
      channels: c.channels,
      quietHours: c.quietHours,
      userId: c.userId,
      username: users.find((u) => u.id === c.userId)?.username ?? null,
      active: c.active,
      groupIds: members.filter((r) => r.contactId === c.id).map((r) => r.groupId),
      createdAt: c.createdAt,
      updatedAt: c.updatedAt,
    }));
  }

  private toGroupDto(group: ContactGroupEntity, members: ContactGroupMemberEntity[]): GroupDto {
    return {
      id: group.id,
      name: group.name,
      description: group.description,
      contactIds: members.filter((r) => r.groupId === group.id).map((r) => r.contactId),
      createdAt: group.createdAt,
      updatedAt: group.updatedAt,
    };
  }
}
