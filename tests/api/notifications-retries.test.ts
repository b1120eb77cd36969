import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { startNotifyServer, openTriggers, type NotifyTestServer } from "../helpers/notify-harness.ts";
import { makeContact, makeGroup } from "../helpers/notify-fixtures.ts";
import { NotificationEntity } from "../../server/entities/notification.entity.ts";
import { DeliveryAttemptEntity } from "../../server/entities/delivery-attempt.entity.ts";

/**
 * With the fakes refusing half of all requests, every message still arrives exactly once: refused
 * sends are retried with back-off, and when the refusal comes after the fake stored the message (a
 * lost reply), the resend carries the same Message-ID / idempotency key and the fake drops it.
 */
const PEOPLE = 12;
let server: NotifyTestServer;
let groupId: number;
const emails: string[] = [];
const mobiles: string[] = [];

beforeAll(async () => {
  server = await startNotifyServer({ NOTIFY_CONCURRENCY: "3" });
  const ids: number[] = [];
  for (let i = 0; i < PEOPLE; i++) {
    emails.push(`partner${i}@example.test`);
    mobiles.push(`+1555010${String(200 + i)}`);
    ids.push((await makeContact(server, { name: `Partner ${i} (test)`, email: emails[i], mobile: mobiles[i], channels: ["email", "sms"] })).id);
  }
  groupId = (await makeGroup(server, ids)).id;
});
afterAll(async () => server.close());

async function runWithFailures(failAfterStoring: boolean) {
  const { fakes } = server.services.notify;
  fakes.mail.clear();
  fakes.sms.clear();
  fakes.setBehaviour({ mail: { failureRate: 0.5, failAfterStoring }, sms: { failureRate: 0.5, failAfterStoring } });
  try {
    const [trigger] = await openTriggers(server, [{ severity: "urgent", recipients: { onCall: false, contactIds: [], groupIds: [groupId] } }]);
    expect(await server.services.notify.dispatcher.settle(90_000)).toBe(true);
    return trigger!;
  } finally {
    fakes.setBehaviour({ mail: { failureRate: 0 }, sms: { failureRate: 0 } });
  }
}

async function expectEachOnce(triggerId: number) {
  const { fakes } = server.services.notify;
  const mails = fakes.mail.list().filter((m) => m.triggerId === triggerId);
  const texts = fakes.sms.list().filter((s) => s.triggerId === triggerId);
  expect(mails.map((m) => m.to[0]).sort()).toEqual([...emails].sort());
  expect(texts.map((s) => s.to[0]).sort()).toEqual([...mobiles].sort());
  const rows = await server.dataSource.getRepository(NotificationEntity).find({ where: { triggerId } });
  expect(rows).toHaveLength(2 * PEOPLE);
  expect(rows.every((r) => r.state === "sent")).toBe(true);
  // Every try is on record: retries first, then the one that went through.
  const attempts = await server.dataSource.getRepository(DeliveryAttemptEntity).find({ order: { attempt: "ASC" } });
  for (const row of rows) {
    const log = attempts.filter((a) => a.notificationId === row.id).map((a) => a.outcome);
    expect(log).toEqual([...Array(row.attempts - 1).fill("retry"), "sent"]);
  }
  return rows.reduce((sum, r) => sum + r.attempts, 0);
}

describe("retries against fakes that fail half of all requests", () => {
  it("delivers every message exactly once when refusals come before the fake stores anything", async () => {
    const trigger = await runWithFailures(false);
    const attempts = await expectEachOnce(trigger.id);
    const { mail, sms } = server.services.notify.fakes.status();
    expect(mail.refused + sms.refused).toBeGreaterThan(0);
    expect(attempts).toBe(2 * PEOPLE + mail.refused + sms.refused);
  });

  it("delivers every message exactly once when the fake stores a message and then loses the reply", async () => {
    const trigger = await runWithFailures(true);
    await expectEachOnce(trigger.id);
    const { mail, sms } = server.services.notify.fakes.status();
    // Every lost reply led to a resend that the fake recognised and dropped.
    expect(mail.refused + sms.refused).toBeGreaterThan(0);
    expect(mail.duplicatesIgnored + sms.duplicatesIgnored).toBeGreaterThan(0);
  });
});
