import type { EntityManager } from "typeorm";
import type { RuleDefinition } from "../../shared/api/rules.ts";
import { ContactEntity } from "../entities/contact.entity.ts";
import { RuleVersionEntity } from "../entities/rule-version.entity.ts";
import type { TriggerEntity } from "../entities/trigger.entity.ts";
import type { ContactService } from "./contact.service.ts";
import type { OnCallService } from "./on-call.service.ts";
import type { NotifySettingsService } from "./notify-settings.service.ts";

/** Highest escalation level: 1 = the lead on shift, 2 = the office's named contact. */
export const MAX_ESCALATION_LEVEL = 2;

export interface Recipients {
  contacts: ContactEntity[];
  /** Why the list is what it is, for the trigger's history ("2 on shift, 1 contact, 2 in Partners"). */
  explanation: string;
}

const unique = (list: ContactEntity[]) => list.filter((c, i) => c.active && list.findIndex((o) => o.id === c.id) === i);

/** Works out who hears about a trigger: the rule's recipients, or an escalation level's targets. */
export class RecipientResolver {
  constructor(
    private readonly contacts: ContactService,
    private readonly onCall: OnCallService,
    private readonly settings: NotifySettingsService,
  ) {}

  /**
   * The rule version's recipients at `at`. "Whoever is on shift" means the forecasters on shift;
   * when no forecaster is on shift, the leads on shift stand in, so the rule never goes unheard
   * because one role is missing from the schedule.
   */
  async forRule(m: EntityManager, trigger: TriggerEntity, at: Date): Promise<Recipients> {
    const version = await m.getRepository(RuleVersionEntity).findOneByOrFail({ id: trigger.ruleVersionId });
    const { recipients } = JSON.parse(version.definition) as RuleDefinition;
    const parts: string[] = [];
    let onShift: ContactEntity[] = [];
    if (recipients.onCall) {
      onShift = await this.onCall.onShift(m, at, "forecaster");
      if (onShift.length === 0) {
        onShift = await this.onCall.onShift(m, at, "lead");
        parts.push(onShift.length ? `no forecaster on shift, so ${onShift.length} lead(s) on shift` : "nobody on shift");
      } else {
        parts.push(`${onShift.length} forecaster(s) on shift`);
      }
    }
    const named = await this.contacts.contactsByIds(m, recipients.contactIds);
    if (recipients.contactIds.length) parts.push(`${named.filter((c) => c.active).length} named contact(s)`);
    const members = await this.contacts.groupMembers(m, recipients.groupIds);
    if (recipients.groupIds.length) parts.push(`${members.filter((c) => c.active).length} group member(s)`);
    return { contacts: unique([...onShift, ...named, ...members]), explanation: parts.join(", ") };
  }

  /** Targets of one escalation level at `at`. */
  async forEscalation(m: EntityManager, level: number, at: Date): Promise<Recipients> {
    if (level === 1) {
      const leads = await this.onCall.onShift(m, at, "lead");
      return { contacts: unique(leads), explanation: leads.length ? `lead(s) on shift: ${leads.map((c) => c.name).join(", ")}` : "no lead on shift" };
    }
    const id = (await this.settings.get(m)).escalationContactId;
    const contact = id === null ? null : await m.getRepository(ContactEntity).findOne({ where: { id } });
    if (!contact || !contact.active) return { contacts: [], explanation: id === null ? "no escalation contact is set" : "the escalation contact is inactive or gone" };
    return { contacts: [contact], explanation: `escalation contact ${contact.name}` };
  }
}
