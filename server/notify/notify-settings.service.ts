import type { DataSource, EntityManager } from "typeorm";
import { DEFAULT_TEMPLATES, TEMPLATE_KEYS, type NotifySettingsInput, type TemplateKey } from "../../shared/api/notifications.ts";
import { ContactEntity } from "../entities/contact.entity.ts";
import { NotifySettingEntity } from "../entities/notify-setting.entity.ts";
import { appendAudit, type AuditActor } from "../audit/audit-log.ts";
import { writeTransaction } from "../db/data-source.ts";
import { ValidationError } from "../errors.ts";

export type NotifySettings = NotifySettingsInput;

const TEMPLATES_KEY = "templates";
const ESCALATION_CONTACT_KEY = "escalationContactId";

/** The office's message templates and last escalation contact; defaults fill whatever was never set. */
export class NotifySettingsService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly now: () => Date = () => new Date(),
  ) {}

  async get(m: EntityManager = this.dataSource.manager): Promise<NotifySettings> {
    const rows = await m.getRepository(NotifySettingEntity).find();
    const value = (key: string): unknown => {
      const row = rows.find((r) => r.key === key);
      return row ? (JSON.parse(row.value) as unknown) : undefined;
    };
    const stored = (value(TEMPLATES_KEY) ?? {}) as Partial<Record<TemplateKey, string>>;
    const templates = Object.fromEntries(TEMPLATE_KEYS.map((k) => [k, stored[k] ?? DEFAULT_TEMPLATES[k]])) as Record<TemplateKey, string>;
    return { templates, escalationContactId: (value(ESCALATION_CONTACT_KEY) as number | null | undefined) ?? null };
  }

  async update(actor: AuditActor, input: NotifySettings): Promise<NotifySettings> {
    await writeTransaction(this.dataSource, async (m) => {
      if (input.escalationContactId !== null && !(await m.getRepository(ContactEntity).exists({ where: { id: input.escalationContactId } }))) {
        throw new ValidationError(`No contact with id ${input.escalationContactId}.`, { issues: [{ field: "escalationContactId", message: "Pick an existing contact" }] });
      }
      const before = await this.get(m);
      await this.write(m, actor, TEMPLATES_KEY, input.templates);
      await this.write(m, actor, ESCALATION_CONTACT_KEY, input.escalationContactId);
      await appendAudit(m, actor, { action: "notify_settings.updated", targetType: "notify_settings", targetId: null, before, after: input }, this.now());
    });
    return this.get();
  }

  private async write(m: EntityManager, actor: AuditActor, key: string, value: unknown): Promise<void> {
    await m.getRepository(NotifySettingEntity).save({ key, value: JSON.stringify(value), updatedAt: this.now().toISOString(), updatedBy: actor.username });
  }
}
