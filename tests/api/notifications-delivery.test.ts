import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { decode as decodePng } from "fast-png";
import { signIn } from "../helpers/test-server.ts";
import { startNotifyServer, openTriggers, type NotifyTestServer } from "../helpers/notify-harness.ts";
import { makeContact, makeShift } from "../helpers/notify-fixtures.ts";
import { SAFETY_CAUTION } from "../../shared/caution.ts";
import { severityLevel } from "../../shared/rules/severity.ts";
import { writeTransaction } from "../../server/db/data-source.ts";
import { NotificationEntity } from "../../server/entities/notification.entity.ts";
import { TriggerEventEntity } from "../../server/entities/trigger-event.entity.ts";
import { AuditEntryEntity } from "../../server/entities/audit-entry.entity.ts";
import { escapeHtml } from "../../server/notify/content/html-escape.ts";

/**
 * Real parts end to end: a trigger opened by the real engine writes outbox rows, the dispatcher
 * sends them with nodemailer to the SMTP fake and with the provider's SDK to the SMS fake, and the
 * messages that arrive are parsed and checked.
 */
let server: NotifyTestServer;
let dutyId: number;

const rowsOf = (triggerId: number) => server.dataSource.getRepository(NotificationEntity).find({ where: { triggerId }, order: { id: "ASC" } });
const eventsOf = (triggerId: number, kind: string) => server.dataSource.getRepository(TriggerEventEntity).find({ where: { triggerId, kind: kind as never } });

beforeAll(async () => {
  server = await startNotifyServer();
  const duty = await makeContact(server, { name: "Duty forecaster (test)", email: "duty@example.test", mobile: "+15550100111", channels: ["email", "sms"] });
  dutyId = duty.id;
  const now = Date.now();
  await makeShift(server, duty.id, "forecaster", new Date(now - 3_600_000), new Date(now + 3_600_000));
});
afterAll(async () => server.close());

describe("a trigger's messages arrive in the local fakes", () => {
  it("e-mails and texts the forecaster on shift with everything the message must carry", async () => {
    const [trigger] = await openTriggers(server, [{ severity: "serious" }]);
    expect(trigger).toBeDefined();
    expect(await server.services.notify.dispatcher.settle()).toBe(true);

    const mails = server.services.notify.fakes.mail.list().filter((m) => m.triggerId === trigger!.id);
    expect(mails).toHaveLength(1);
    const mail = mails[0]!;
    expect(mail.to).toEqual(["duty@example.test"]);
    expect(mail.subject).toContain("New trigger");
    expect(mail.subject).toContain("Serious");
    expect(mail.subject).toContain("Notify test zone");
    const oneLine = (text: string) => text.replace(/\s+/g, " ");
    expect(oneLine(mail.text)).toContain(SAFETY_CAUTION);
    expect(mail.text).toContain(`http://bellwether.test/triggers/${trigger!.id}`);
    expect(mail.text).toMatch(/Valid \(UTC\): 2026-05-14 18:00Z/);
    // 18:00Z on 14 May 2026 is 13:00 CDT (UTC-5). Source: Energy Policy Act of 2005, sec. 110 (daylight time from March to November).
    expect(mail.text).toContain("13:00 CDT");
    expect(mail.text).toMatch(/shear_0_6km: [\d.,]+( to [\d.,]+)? kt/);
    expect(oneLine(mail.html!)).toContain(escapeHtml(SAFETY_CAUTION));
    expect(mail.html).toContain('src="cid:trigger-map@bellwether"');
    expect(mail.attachments).toEqual([expect.objectContaining({ filename: "trigger-map.png", contentType: "image/png", inline: true })]);

    // The map is a real PNG: zone outline and matched points in the severity colour.
    const png = decodePng(server.services.notify.fakes.mail.attachment(mail.id, 0)!);
    expect(png.width).toBeGreaterThan(50);
    const colours = new Set<string>();
    for (let k = 0; k < png.data.length; k += png.channels) colours.add(`${png.data[k]},${png.data[k + 1]},${png.data[k + 2]}`);
    const [r, g, b] = severityLevel("serious").colour.match(/[0-9a-f]{2}/gi)!.map((h) => parseInt(h, 16));
    expect(colours.has(`${r},${g},${b}`)).toBe(true);
    expect(colours.has("242,244,247")).toBe(true); // the surroundings outside the zone

    const texts = server.services.notify.fakes.sms.list().filter((s) => s.triggerId === trigger!.id);
    expect(texts).toHaveLength(1);
    expect(texts[0]!.to).toEqual(["+15550100111"]);
    expect(texts[0]!.body.length).toBeLessThanOrEqual(320);
    expect(texts[0]!.body).toContain(`http://bellwether.test/triggers/${trigger!.id}`);

    const rows = await rowsOf(trigger!.id);
    expect(rows.map((r) => [r.channel, r.state, r.attempts])).toEqual([
      ["email", "sent", 1],
      ["sms", "sent", 1],
    ]);
    expect(rows[1]!.providerMessageId).toBe(texts[0]!.id);
    expect(await eventsOf(trigger!.id, "notified")).toHaveLength(2);
    const audits = await server.dataSource.getRepository(AuditEntryEntity).find({ where: { action: "notification.sent" } });
    expect(audits.filter((a) => rows.some((r) => String(r.id) === a.targetId))).toHaveLength(2);
  });

  it("lists deliveries per trigger for every role, and the fakes' inboxes for admins only", async () => {
    const [trigger] = await openTriggers(server, [{ severity: "urgent" }]);
    await server.services.notify.dispatcher.settle();
    const forecaster = await signIn(server.app, "forecaster");
    const list = await forecaster.agent.get(`/api/notifications?triggerId=${trigger!.id}`);
    expect(list.status).toBe(200);
    expect(list.body.notifications).toHaveLength(2);
    expect(list.body.notifications[0]).toMatchObject({ triggerId: trigger!.id, state: "sent", recipientName: "Duty forecaster (test)", attemptLog: [expect.objectContaining({ attempt: 1, outcome: "sent" })] });
    expect((await forecaster.agent.get("/api/fakes/mail")).status).toBe(403);

    const admin = await signIn(server.app, "admin");
    const mail = await admin.agent.get("/api/fakes/mail");
    expect(Array.isArray(mail.body)).toBe(true);
    expect(mail.body[0]).toMatchObject({ triggerId: trigger!.id, to: ["duty@example.test"], subject: expect.stringContaining("Urgent") });
    // Newest first.
    expect(mail.body[0].receivedAt >= mail.body.at(-1).receivedAt).toBe(true);
    const sms = await admin.agent.get("/api/fakes/sms");
    expect(sms.body[0]).toMatchObject({ triggerId: trigger!.id, to: ["+15550100111"], body: expect.stringContaining("/triggers/") });
  });

  it("writes each change once per recipient and channel, however often it is reported", async () => {
    const [trigger] = await openTriggers(server, [{ severity: "serious" }]);
    const before = (await rowsOf(trigger!.id)).length;
    for (let i = 0; i < 3; i++) await writeTransaction(server.dataSource, (m) => server.services.notify.notifier.onTriggerChange(m, trigger!, "opened"));
    expect((await rowsOf(trigger!.id)).length).toBe(before);
    expect(before).toBe(2);
    expect(await eventsOf(trigger!.id, "notify-failed")).toEqual([]);

    // A rise in severity is news again, once per new severity.
    trigger!.severity = "urgent";
    for (let i = 0; i < 2; i++) await writeTransaction(server.dataSource, (m) => server.services.notify.notifier.onTriggerChange(m, trigger!, "severity-rose"));
    const rows = await rowsOf(trigger!.id);
    expect(rows.map((r) => r.idempotencyKey).slice(2)).toEqual([`t${trigger!.id}.rose-urgent.c${dutyId}.email`, `t${trigger!.id}.rose-urgent.c${dutyId}.sms`]);
  });

  it("marks a trigger that reaches nobody instead of dropping it silently", async () => {
    const idle = await makeContact(server, { name: "Inactive partner (test)", active: false });
    const [trigger] = await openTriggers(server, [{ recipients: { onCall: false, contactIds: [idle.id], groupIds: [] } }]);
    expect(await rowsOf(trigger!.id)).toEqual([]);
    const failed = await eventsOf(trigger!.id, "notify-failed");
    expect(failed).toHaveLength(1);
    expect(failed[0]!.note).toContain("nobody to notify");
  });

  it("marks a final failure on the trigger and in the audit, and a lead can send it again", async () => {
    server.services.notify.fakes.mail.misbehaviour.set({ failureRate: 1, failAfterStoring: false });
    const [trigger] = await openTriggers(server, [{ severity: "serious", recipients: { onCall: false, contactIds: [dutyId], groupIds: [] } }]);
    await server.services.notify.dispatcher.settle(60_000);
    server.services.notify.fakes.mail.misbehaviour.set({ failureRate: 0 });
    const mailRow = (await rowsOf(trigger!.id)).find((r) => r.channel === "email")!;
    expect(mailRow.state).toBe("failed");
    expect(mailRow.attempts).toBe(30); // NOTIFY_MAX_ATTEMPTS in FAST_NOTIFY_ENV
    expect(mailRow.lastError).toContain("451");
    const failed = await eventsOf(trigger!.id, "notify-failed");
    expect(failed).toHaveLength(1);
    expect(failed[0]!.note).toContain("gave up after 30 attempt(s)");
    expect(await server.dataSource.getRepository(AuditEntryEntity).count({ where: { action: "notification.failed", targetId: String(mailRow.id) } })).toBe(1);

    const lead = await signIn(server.app, "lead");
    const resent = await lead.agent.post(`/api/notifications/${mailRow.id}/resend`).set("x-csrf-token", lead.csrf).send({});
    expect(resent.status).toBe(200);
    await server.services.notify.dispatcher.settle();
    const after = (await rowsOf(trigger!.id)).find((r) => r.id === mailRow.id)!;
    expect(after).toMatchObject({ state: "sent", attempts: 31 });
    expect(server.services.notify.fakes.mail.list().filter((m) => m.triggerId === trigger!.id)).toHaveLength(1);
  });
});
