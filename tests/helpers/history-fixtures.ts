import { TriggerEntity } from "../../server/entities/trigger.entity.ts";
import { TriggerEventEntity } from "../../server/entities/trigger-event.entity.ts";
import { NotificationEntity } from "../../server/entities/notification.entity.ts";
import { DeliveryAttemptEntity } from "../../server/entities/delivery-attempt.entity.ts";
import type { TriggerEventKind, TriggerState } from "../../shared/api/triggers.ts";
import type { Severity } from "../../shared/rules/severity.ts";
import type { TestServer } from "./test-server.ts";

/**
 * Rows written straight into the tables, so history and verification tests control every time
 * and state exactly (the engine's own path to them is tested in rules-triggers.test.ts).
 */
export interface TriggerFixture {
  ruleId: number;
  ruleVersionId: number;
  zoneId: number;
  openedAt: string;
  firstValidTime: string;
  lastValidTime: string;
  severity?: Severity;
  state?: TriggerState;
  acknowledgedBy?: string | null;
  acknowledgedAt?: string | null;
}

let made = 0;

export async function insertTrigger(server: Pick<TestServer, "dataSource">, f: TriggerFixture): Promise<number> {
  const saved = await server.dataSource.getRepository(TriggerEntity).save({
    triggerKey: `history-fixture-${++made}`,
    ruleId: f.ruleId,
    ruleVersionId: f.ruleVersionId,
    zoneId: f.zoneId,
    severity: f.severity ?? "serious",
    state: f.state ?? "open",
    model: "fixture",
    runTime: f.openedAt,
    firstValidTime: f.firstValidTime,
    lastValidTime: f.lastValidTime,
    matchedValidTimes: JSON.stringify([f.firstValidTime, f.lastValidTime]),
    peak: JSON.stringify({ coveragePercent: 40, matchedPoints: 7, fields: [] }),
    openedAt: f.openedAt,
    updatedAt: f.openedAt,
    acknowledgedBy: f.acknowledgedBy ?? null,
    acknowledgedAt: f.acknowledgedAt ?? null,
    closedAt: null,
    closedBy: null,
    closeReason: null,
  });
  return saved.id;
}

export async function insertEvent(server: Pick<TestServer, "dataSource">, triggerId: number, kind: TriggerEventKind, at: string, actor: string | null = null, note: string | null = null) {
  await server.dataSource.getRepository(TriggerEventEntity).save({ triggerId, kind, at, actor, note, data: null });
}

/** An outbox row with its delivery attempts (each attempt "retry" except the last, which is the final outcome). */
export async function insertNotification(
  server: Pick<TestServer, "dataSource">,
  triggerId: number,
  state: "sent" | "failed",
  createdAt: string,
  attempts = 1,
): Promise<number> {
  const row = await server.dataSource.getRepository(NotificationEntity).save({
    triggerId,
    triggerIds: [triggerId],
    change: "opened",
    level: null,
    channel: state === "sent" ? "email" : "sms",
    contactId: null,
    recipientName: "Fixture duty forecaster",
    address: state === "sent" ? "duty@example.test" : "+15550100123",
    template: "trigger",
    severity: "serious",
    idempotencyKey: `history-fixture-notification-${++made}`,
    state,
    attempts,
    nextAttemptAt: null,
    heldUntil: null,
    digestId: null,
    providerMessageId: state === "sent" ? `fixture-${made}` : null,
    lastError: state === "failed" ? "provider refused the number" : null,
    createdAt,
    updatedAt: createdAt,
    sentAt: state === "sent" ? createdAt : null,
  });
  for (let k = 1; k <= attempts; k++) {
    const outcome = k < attempts ? "retry" : state === "sent" ? "sent" : "failed";
    await server.dataSource.getRepository(DeliveryAttemptEntity).save({ notificationId: row.id, attempt: k, outcome, startedAt: createdAt, finishedAt: createdAt, providerMessageId: null, error: outcome === "sent" ? null : "refused" });
  }
  return row.id;
}
