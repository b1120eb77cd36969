import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { startNotifyServer, openTriggers, type NotifyTestServer } from "../helpers/notify-harness.ts";
import { makeContact, makeShift } from "../helpers/notify-fixtures.ts";
import { DEFAULT_TEMPLATES } from "../../shared/api/notifications.ts";
import { SYSTEM_ACTOR } from "../../server/audit/audit-log.ts";
import { TriggerEventEntity } from "../../server/entities/trigger-event.entity.ts";
import { NotificationEntity } from "../../server/entities/notification.entity.ts";
import { AuditEntryEntity } from "../../server/entities/audit-entry.entity.ts";

/** Escalation timing on a fake clock: every step of time is set by the test. */
const T0 = Date.parse("2026-05-14T17:00:00Z");
const clock = { t: T0 };
const at = (minutes: number, seconds = 0) => (clock.t = T0 + minutes * 60_000 + seconds * 1000);
let server: NotifyTestServer;
let leadId: number;
let chiefId: number;

const escalations = (triggerId: number) => server.dataSource.getRepository(TriggerEventEntity).find({ where: { triggerId, kind: "escalated" }, order: { id: "ASC" } });
const escalationMail = (triggerId: number) =>
  server.services.notify.fakes.mail
    .list()
    .filter((m) => m.triggerId === triggerId && m.subject.includes("Escalation"))
    .map((m) => [m.subject.match(/level \d/)![0], m.to[0]]);

async function tick(minutes: number, seconds = 0): Promise<number> {
  at(minutes, seconds);
  const recorded = await server.services.notify.escalation.escalateOverdue();
  await server.services.notify.dispatcher.settle();
  return recorded;
}

beforeAll(async () => {
  server = await startNotifyServer({ ESCALATION_MINUTES: "15" }, { now: () => new Date(clock.t) });
  const forecaster = await makeContact(server, { name: "Night forecaster (test)", email: "night@example.test" });
  const lead = await makeContact(server, { name: "Shift lead (test)", email: "lead@example.test" });
  const chief = await makeContact(server, { name: "Meteorologist in charge (test)", email: "chief@example.test" });
  leadId = lead.id;
  chiefId = chief.id;
  await makeShift(server, forecaster.id, "forecaster", new Date(T0 - 3_600_000), new Date(T0 + 4 * 3_600_000));
  await makeShift(server, lead.id, "lead", new Date(T0 - 3_600_000), new Date(T0 + 4 * 3_600_000));
  await server.services.notify.settings.update(SYSTEM_ACTOR, { templates: DEFAULT_TEMPLATES, escalationContactId: chief.id });
});
afterAll(async () => server.close());

describe("escalation of triggers nobody acknowledged", () => {
  it("tells the lead on shift after one deadline, the named contact after two, and stops there; an acknowledgement stops it", async () => {
    at(0);
    const [plain, acknowledged, quick] = await openTriggers(server, [{ name: "Office default deadline" }, { name: "Acknowledged in time" }, { name: "Own deadline", escalateAfterMinutes: 5 }]);
    await server.services.notify.dispatcher.settle();

    expect(await tick(4, 59)).toBe(0);
    expect(await tick(5)).toBe(1); // the rule's own 5-minute deadline
    expect(escalationMail(quick!.id)).toEqual([["level 1", "lead@example.test"]]);

    at(9);
    await server.services.triggers.acknowledge({ username: "forecaster", roles: ["forecaster"] }, acknowledged!.id, "on it");
    expect(await tick(10)).toBe(1); // quick, level 2
    expect(escalationMail(quick!.id)).toEqual([
      ["level 2", "chief@example.test"],
      ["level 1", "lead@example.test"],
    ]);

    expect(await tick(14, 59)).toBe(0);
    expect(await tick(15)).toBe(1); // plain, level 1 at the office default of 15 minutes
    expect(escalationMail(plain!.id)).toEqual([["level 1", "lead@example.test"]]);
    expect(await tick(29, 59)).toBe(0);
    expect(await tick(30)).toBe(1);
    expect(escalationMail(plain!.id)[0]).toEqual(["level 2", "chief@example.test"]);
    expect(await tick(120)).toBe(0); // two levels, then no more

    expect(await escalations(acknowledged!.id)).toEqual([]);
    const plainEvents = await escalations(plain!.id);
    expect(plainEvents.map((e) => [JSON.parse(e.data!).level, e.at])).toEqual([
      [1, new Date(T0 + 15 * 60_000).toISOString()],
      [2, new Date(T0 + 30 * 60_000).toISOString()],
    ]);
    expect(plainEvents[0]!.note).toContain("Shift lead (test)");
    const audits = await server.dataSource.getRepository(AuditEntryEntity).find({ where: { action: "trigger.escalated", targetId: String(plain!.id) } });
    expect(audits).toHaveLength(2);
    const rows = await server.dataSource.getRepository(NotificationEntity).find({ where: { triggerId: plain!.id, change: "escalated" }, order: { id: "ASC" } });
    expect(rows.map((r) => [r.level, r.contactId, r.state])).toEqual([
      [1, leadId, "sent"],
      [2, chiefId, "sent"],
    ]);
  });

  it("goes straight to the named contact when no lead is on shift", async () => {
    at(5 * 60); // 22:00Z: the test shifts ended at 21:00Z
    const [trigger] = await openTriggers(server, [{ name: "Late trigger", recipients: { onCall: false, contactIds: [chiefId], groupIds: [] } }]);
    await server.services.notify.dispatcher.settle();
    expect(await tick(5 * 60 + 15)).toBe(2);
    const events = await escalations(trigger!.id);
    expect(events.map((e) => JSON.parse(e.data!).level)).toEqual([1, 2]);
    expect(events[0]!.note).toContain("no lead on shift");
    expect(escalationMail(trigger!.id)).toEqual([["level 2", "chief@example.test"]]);
  });
});
