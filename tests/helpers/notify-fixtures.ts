import { contactInput, groupInput, shiftInput, type ContactInput } from "../../shared/api/notifications.ts";
import { SYSTEM_ACTOR } from "../../server/audit/audit-log.ts";
import { NotificationEntity } from "../../server/entities/notification.entity.ts";
import type { TestServer } from "./test-server.ts";

let made = 0;

/** A contact created through the service, with the schema's defaults filled in. */
export async function makeContact(server: Pick<TestServer, "services">, input: Partial<ContactInput> = {}) {
  const n = ++made;
  return server.services.notify.contacts.createContact(SYSTEM_ACTOR, contactInput.parse({ name: `Fixture contact ${n}`, email: `fixture${n}@example.test`, channels: ["email"], ...input }));
}

export async function makeGroup(server: Pick<TestServer, "services">, contactIds: number[] = []) {
  return server.services.notify.contacts.createGroup(SYSTEM_ACTOR, groupInput.parse({ name: `Fixture group ${++made}`, contactIds }));
}

/** A shift for `contactId` covering [from, to). */
export async function makeShift(server: Pick<TestServer, "services">, contactId: number, role: "forecaster" | "lead", from: Date, to: Date) {
  return server.services.notify.onCall.create(SYSTEM_ACTOR, shiftInput.parse({ contactId, role, startsAt: from.toISOString(), endsAt: to.toISOString() }));
}

/** An outbox row in the given state, written directly (for routes that act on one). */
export async function insertNotification(server: Pick<TestServer, "dataSource">, triggerId: number, state: "failed" | "sent" = "failed"): Promise<number> {
  const at = new Date().toISOString();
  const row = await server.dataSource.getRepository(NotificationEntity).save({
    triggerId,
    triggerIds: [triggerId],
    change: "opened",
    level: null,
    channel: "email",
    contactId: null,
    recipientName: "Fixture recipient",
    address: "fixture@example.test",
    template: "trigger",
    severity: "serious",
    idempotencyKey: `fixture.${++made}.${Date.now()}`,
    state,
    attempts: 1,
    nextAttemptAt: null,
    heldUntil: null,
    digestId: null,
    providerMessageId: null,
    lastError: state === "failed" ? "fixture failure" : null,
    createdAt: at,
    updatedAt: at,
    sentAt: state === "sent" ? at : null,
  });
  return row.id;
}
