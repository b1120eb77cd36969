import type { EntityManager } from "typeorm";
import type { TriggerEntity } from "../entities/trigger.entity.ts";

/** Why a trigger needs people told about it. */
export type NotifiableChange = "opened" | "severity-rose" | "escalated";

/**
 * The hook through which trigger changes reach the notification outbox. It runs inside the
 * transaction that changes the trigger, so the outbox rows commit with the change or not at all.
 */
export interface TriggerNotifier {
  onTriggerChange(manager: EntityManager, trigger: TriggerEntity, change: NotifiableChange, detail?: { level?: number; note?: string }): Promise<void>;
}

/** Used until notifications are configured: records nothing. */
export const SILENT_NOTIFIER: TriggerNotifier = { onTriggerChange: async () => {} };
