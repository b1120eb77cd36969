import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { signIn } from "../helpers/test-server.ts";
import { startNotifyServer, openTriggers, type NotifyTestServer } from "../helpers/notify-harness.ts";
import { makeContact } from "../helpers/notify-fixtures.ts";
import { NotificationEntity } from "../../server/entities/notification.entity.ts";

/**
 * Quiet hours on a fake clock. The contact keeps quiet from 22:00 to 06:30 Chicago time; the test
 * starts at 05:00Z on 14 May 2026, which is midnight CDT (UTC-5), so quiet hours end at 11:30Z.
 * Source: Energy Policy Act of 2005, sec. 110 (US daylight time in May); the rest derived in closed form.
 */
const T0 = Date.parse("2026-05-14T05:00:00Z");
const QUIET_END = "2026-05-14T11:30:00.000Z";
const clock = { t: T0 };
let server: NotifyTestServer;
let contactId: number;

const rowsOf = (triggerId: number) => server.dataSource.getRepository(NotificationEntity).find({ where: { triggerId }, order: { id: "ASC" } });

beforeAll(async () => {
  server = await startNotifyServer({}, { now: () => new Date(clock.t) });
  contactId = (
    await makeContact(server, {
      name: "Event organiser (test)",
      email: "organiser@example.test",
      mobile: "+15550100401",
      channels: ["email", "sms"],
      quietHours: { start: "22:00", end: "06:30", timeZone: "America/Chicago" },
    })
  ).id;
});
afterAll(async () => server.close());

describe("quiet hours and digests", () => {
  it("holds heads-up messages until quiet hours end and sends them as one digest per channel; serious ones go at once", async () => {
    const recipients = { onCall: false, contactIds: [contactId], groupIds: [] };
    const [first, second, serious] = await openTriggers(server, [
      { name: "Heads-up one", severity: "heads-up", recipients },
      { name: "Heads-up two", severity: "heads-up", recipients },
      { name: "Serious at night", severity: "serious", recipients },
    ]);
    await server.services.notify.dispatcher.settle();
    const { fakes } = server.services.notify;

    // The serious trigger reached the contact straight away, on both channels.
    expect(fakes.mail.list().map((m) => m.triggerId)).toEqual([serious!.id]);
    expect(fakes.sms.list().map((s) => s.triggerId)).toEqual([serious!.id]);
    for (const trigger of [first!, second!]) {
      expect((await rowsOf(trigger.id)).map((r) => [r.channel, r.state, r.heldUntil])).toEqual([
        ["email", "held", QUIET_END],
        ["sms", "held", QUIET_END],
      ]);
    }

    clock.t = Date.parse(QUIET_END) - 60_000;
    expect(await server.services.notify.digests.releaseDue()).toBe(0);

    clock.t = Date.parse(QUIET_END);
    expect(await server.services.notify.digests.releaseDue()).toBe(2);
    await server.services.notify.dispatcher.settle();

    const digestMail = fakes.mail.list().filter((m) => m.triggerIds.length === 2);
    expect(digestMail).toHaveLength(1);
    expect(digestMail[0]!.triggerIds).toEqual([first!.id, second!.id]);
    expect(digestMail[0]!.subject).toContain("2 heads-up trigger(s)");
    expect(digestMail[0]!.text).toContain("Heads-up one");
    expect(digestMail[0]!.text).toContain("Heads-up two");
    expect(digestMail[0]!.text).toContain("Caution:");
    const digestSms = fakes.sms.list().filter((s) => s.triggerIds.length === 2);
    expect(digestSms).toHaveLength(1);
    expect(digestSms[0]!.body.length).toBeLessThanOrEqual(320);
    expect(fakes.mail.list()).toHaveLength(2);
    expect(fakes.sms.list()).toHaveLength(2);

    // Each held row points at the digest that carried it; a second release finds nothing.
    const held = [...(await rowsOf(first!.id)), ...(await rowsOf(second!.id))];
    expect(held.every((r) => r.state === "digested" && r.digestId !== null)).toBe(true);
    expect(await server.services.notify.digests.releaseDue()).toBe(0);

    const forecaster = await signIn(server.app, "forecaster");
    const deliveries = (await forecaster.agent.get(`/api/notifications?triggerId=${first!.id}`)).body.notifications as Array<{ change: string; state: string }>;
    expect(deliveries.map((d) => [d.change, d.state]).sort()).toEqual([
      ["digest", "sent"],
      ["digest", "sent"],
      ["opened", "digested"],
      ["opened", "digested"],
    ]);
  });
});
