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

/** One e-mail with a small PNG attachment, sent with nodemailer into the server's mail fake (started if needed); returns its id there. */
export async function deliverFakeMail(server: Pick<TestServer, "services">): Promise<number> {
  const { createMailSender } = await import("../../server/notify/channels/mail-sender.ts");
  const fake = server.services.notify.fakes.mail;
  const port = await fake.start();
  const sender = createMailSender({ host: "127.0.0.1", port, secure: false, from: "fixture@example.test", plainText: true }, "fake");
  const png = Buffer.from("89504e470d0a1a0a", "hex");
  await sender.send({ to: "fixture@example.test", subject: "Fixture", text: "t", html: "<p>t</p>", attachments: [{ filename: "map.png", content: png, contentType: "image/png" }], messageId: `<fixture-${++made}@example.test>`, triggerIds: [] });
  await sender.close();
  return fake.list()[0]!.id;
}
