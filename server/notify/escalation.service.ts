import type { DataSource, EntityManager } from "typeorm";
import type { RuleDefinition } from "../../shared/api/rules.ts";
import { TriggerEntity } from "../entities/trigger.entity.ts";
import { TriggerEventEntity } from "../entities/trigger-event.entity.ts";
import { RuleVersionEntity } from "../entities/rule-version.entity.ts";
import { appendAudit, SYSTEM_ACTOR } from "../audit/audit-log.ts";
import { writeTransaction } from "../db/data-source.ts";
import type { TriggerService } from "../services/trigger.service.ts";
import type { TriggerNotifier } from "../services/trigger-notifier.ts";
import { MAX_ESCALATION_LEVEL, type RecipientResolver } from "./recipients.ts";

export interface EscalationDeps {
  dataSource: DataSource;
  triggers: TriggerService;
  notifier: TriggerNotifier;
  recipients: RecipientResolver;
  /** Office default, used when the rule sets no deadline of its own. */
  defaultMinutes: number;
  now: () => Date;
}

/**
 * Escalates open triggers nobody acknowledged: one deadline after opening, the lead on shift is
 * told (level 1); a second deadline later, the office's named contact (level 2). Each level is a
 * trigger event "escalated" plus outbox rows through the same notifier. Acknowledging (or any
 * other state than open) stops it, because only open triggers are looked at.
 */
export class EscalationService {
  constructor(private readonly deps: EscalationDeps) {}

  /** One pass over the open triggers; returns how many escalation levels were recorded. */
  async escalateOverdue(): Promise<number> {
    const open = await this.deps.dataSource.getRepository(TriggerEntity).find({ where: { state: "open" }, order: { id: "ASC" } });
    let recorded = 0;
    for (const candidate of open) {
      recorded += await writeTransaction(this.deps.dataSource, (m) => this.escalateOne(m, candidate.id));
    }
    return recorded;
  }

  /** Minutes between escalation levels for a trigger: its rule's own deadline, else the office's. */
  async deadlineMinutes(m: EntityManager, trigger: TriggerEntity): Promise<number> {
    const version = await m.getRepository(RuleVersionEntity).findOne({ where: { id: trigger.ruleVersionId } });
    const own = version ? (JSON.parse(version.definition) as RuleDefinition).escalateAfterMinutes : undefined;
    return own ?? this.deps.defaultMinutes;
  }

  private async escalateOne(m: EntityManager, triggerId: number): Promise<number> {
    // Re-read inside the transaction: an acknowledgement may have landed since the scan.
    const trigger = await m.getRepository(TriggerEntity).findOne({ where: { id: triggerId } });
    if (!trigger || trigger.state !== "open") return 0;
    const now = this.deps.now();
    const minutes = await this.deadlineMinutes(m, trigger);
    let level = (await m.getRepository(TriggerEventEntity).count({ where: { triggerId, kind: "escalated" } })) + 1;
    let recorded = 0;
    while (level <= MAX_ESCALATION_LEVEL) {
      const due = Date.parse(trigger.openedAt) + level * minutes * 60_000;
      // A level with nobody to tell hands over to the next one at once rather than waiting again.
      if (now.getTime() < due && recorded === 0) break;
      const targets = await this.deps.recipients.forEscalation(m, level, now);
      const note = targets.contacts.length
        ? `Not acknowledged within ${minutes * level} min: level ${level}, ${targets.explanation}.`
        : `Not acknowledged within ${minutes * level} min: level ${level} has nobody to tell (${targets.explanation}).`;
      await this.deps.triggers.addEvent(m, trigger, "escalated", null, note, { level, deadlineMinutes: minutes, targets: targets.contacts.map((c) => ({ id: c.id, name: c.name })) });
      await appendAudit(m, SYSTEM_ACTOR, { action: "trigger.escalated", targetType: "trigger", targetId: trigger.id, after: { level, deadlineMinutes: minutes, targets: targets.contacts.map((c) => c.id) } }, now);
      await this.deps.notifier.onTriggerChange(m, trigger, "escalated", { level });
      recorded++;
      if (targets.contacts.length > 0) break;
      level++;
    }
    return recorded;
  }
}
