import type { DataSource, EntityManager } from "typeorm";
import { In, LessThan, LessThanOrEqual, MoreThan } from "typeorm";
import type { ShiftDto, ShiftRole, ShiftValues } from "../../shared/api/notifications.ts";
import { ContactEntity } from "../entities/contact.entity.ts";
import { OnCallShiftEntity } from "../entities/on-call-shift.entity.ts";
import { appendAudit, type AuditActor } from "../audit/audit-log.ts";
import { writeTransaction } from "../db/data-source.ts";
import { NotFoundError, ValidationError } from "../errors.ts";

/** The on-call schedule: shifts in UTC, and who is on duty at a given moment. */
export class OnCallService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly now: () => Date = () => new Date(),
  ) {}

  /** Shifts overlapping [from, to), by default from a day ago to a week ahead. */
  async list(from?: string, to?: string): Promise<ShiftDto[]> {
    const start = from ? new Date(from).toISOString() : new Date(this.now().getTime() - 86_400_000).toISOString();
    const end = to ? new Date(to).toISOString() : new Date(this.now().getTime() + 7 * 86_400_000).toISOString();
    const shifts = await this.dataSource.getRepository(OnCallShiftEntity).find({ where: { startsAt: LessThan(end), endsAt: MoreThan(start) }, order: { startsAt: "ASC", role: "ASC" } });
    return this.toDtos(this.dataSource.manager, shifts);
  }

  async create(actor: AuditActor, input: ShiftValues): Promise<ShiftDto> {
    const id = await writeTransaction(this.dataSource, async (m) => {
      await this.assertContact(m, input.contactId);
      const shift = await m.getRepository(OnCallShiftEntity).save({ ...input });
      await appendAudit(m, actor, { action: "on_call.created", targetType: "on_call_shift", targetId: shift.id, after: input }, this.now());
      return shift.id;
    });
    return this.get(id);
  }

  async update(actor: AuditActor, id: number, input: ShiftValues): Promise<ShiftDto> {
    await writeTransaction(this.dataSource, async (m) => {
      const shift = await this.find(m, id);
      await this.assertContact(m, input.contactId);
      const before = { contactId: shift.contactId, role: shift.role, startsAt: shift.startsAt, endsAt: shift.endsAt, note: shift.note };
      await m.getRepository(OnCallShiftEntity).update({ id }, { ...input });
      await appendAudit(m, actor, { action: "on_call.updated", targetType: "on_call_shift", targetId: id, before, after: input }, this.now());
    });
    return this.get(id);
  }

  async remove(actor: AuditActor, id: number): Promise<void> {
    await writeTransaction(this.dataSource, async (m) => {
      const shift = await this.find(m, id);
      await m.getRepository(OnCallShiftEntity).delete({ id });
      await appendAudit(m, actor, { action: "on_call.deleted", targetType: "on_call_shift", targetId: id, before: { contactId: shift.contactId, role: shift.role, startsAt: shift.startsAt, endsAt: shift.endsAt } }, this.now());
    });
  }

  /** Active contacts on shift at `at` in the given role (both roles when omitted). */
  async onShift(m: EntityManager, at: Date, role?: ShiftRole): Promise<ContactEntity[]> {
    const iso = at.toISOString();
    const shifts = await m.getRepository(OnCallShiftEntity).find({ where: { startsAt: LessThanOrEqual(iso), endsAt: MoreThan(iso), ...(role ? { role } : {}) }, order: { startsAt: "ASC" } });
    if (shifts.length === 0) return [];
    const contacts = await m.getRepository(ContactEntity).find({ where: { id: In([...new Set(shifts.map((s) => s.contactId))]), active: true } });
    // Keep the schedule's order: the person whose shift began first is named first.
    return shifts.map((s) => contacts.find((c) => c.id === s.contactId)).filter((c, i, list): c is ContactEntity => c !== undefined && list.indexOf(c) === i);
  }

  private async get(id: number): Promise<ShiftDto> {
    const [dto] = await this.toDtos(this.dataSource.manager, [await this.find(this.dataSource.manager, id)]);
    return dto!;
  }

  private async find(m: EntityManager, id: number): Promise<OnCallShiftEntity> {
    const shift = await m.getRepository(OnCallShiftEntity).findOne({ where: { id } });
    if (!shift) throw new NotFoundError(`On-call shift ${id}`);
    return shift;
  }

  private async assertContact(m: EntityManager, contactId: number): Promise<void> {
    if (!(await m.getRepository(ContactEntity).exists({ where: { id: contactId } }))) {
      throw new ValidationError(`No contact with id ${contactId}.`, { issues: [{ field: "contactId", message: "Pick an existing contact" }] });
    }
  }

  private async toDtos(m: EntityManager, shifts: OnCallShiftEntity[]): Promise<ShiftDto[]> {
    const ids = [...new Set(shifts.map((s) => s.contactId))];
    const contacts = ids.length ? await m.getRepository(ContactEntity).find({ where: { id: In(ids) } }) : [];
    return shifts.map((s) => ({ id: s.id, contactId: s.contactId, contactName: contacts.find((c) => c.id === s.contactId)?.name ?? `contact ${s.contactId}`, role: s.role, startsAt: s.startsAt, endsAt: s.endsAt, note: s.note }));
  }
}
