import type { DataSource } from "typeorm";
import { contactInput, groupInput, shiftInput, DEFAULT_TEMPLATES, type ContactInput } from "../../shared/api/notifications.ts";
import { SYSTEM_ACTOR } from "../audit/audit-log.ts";
import { UserEntity } from "../entities/user.entity.ts";
import type { NotifyServices } from "../notify/notify-module.ts";

const HOUR = 3_600_000;
const OFFICE_TZ = "America/Chicago";

/**
 * The invented office's people to notify: the four demo accounts' contacts, a night forecaster
 * without an account, and two invented partners (a county emergency manager and an event
 * organiser) in a group. Addresses are at example.test and numbers in the +1 555 01xx range, which
 * are set aside for fiction, so nothing can reach a real person.
 */
const STAFF: ReadonlyArray<{ username: string | null; contact: ContactInput }> = [
  { username: "lead", contact: { name: "Marisol Quenby (demo lead)", organisation: "Demo office", email: "marisol.quenby@example.test", mobile: "+15550100101", channels: ["email", "sms"] } },
  { username: "forecaster", contact: { name: "Tobin Achterberg (demo forecaster)", organisation: "Demo office", email: "tobin.achterberg@example.test", mobile: "+15550100102", channels: ["email", "sms"] } },
  { username: "manager", contact: { name: "Ines Kovalczyk (demo manager)", organisation: "Demo office", email: "ines.kovalczyk@example.test", mobile: "+15550100103", channels: ["email"] } },
  { username: "admin", contact: { name: "Perrin Oduya (demo administrator)", organisation: "Demo office", email: "perrin.oduya@example.test", channels: ["email"] } },
  {
    username: null,
    contact: {
      name: "Dalia Verhoeven (demo night forecaster)",
      organisation: "Demo office",
      email: "dalia.verhoeven@example.test",
      mobile: "+15550100104",
      channels: ["email", "sms"],
      // She works nights, so low-severity news waits while she sleeps.
      quietHours: { start: "09:00", end: "17:00", timeZone: OFFICE_TZ },
    },
  },
];

const PARTNERS: readonly ContactInput[] = [
  {
    name: "Hollis Brandvold (demo emergency manager)",
    organisation: "Rennick County Emergency Management (invented)",
    email: "hollis.brandvold@example.test",
    mobile: "+15550100151",
    channels: ["email", "sms"],
    quietHours: { start: "22:00", end: "06:00", timeZone: OFFICE_TZ },
  },
  {
    name: "Junia Castellanos (demo event organiser)",
    organisation: "Wheatfield Summer Fair (invented)",
    email: "junia.castellanos@example.test",
    mobile: "+15550100152",
    channels: ["sms"],
  },
];

/** Seeds the demo contacts, partner group, on-call schedule around `now`, and the escalation contact. */
export async function seedDemoContacts(notify: NotifyServices, dataSource: DataSource, now: Date): Promise<{ partnerGroupId: number }> {
  const ids = new Map<string, number>();
  for (const { username, contact } of STAFF) {
    const user = username ? await dataSource.getRepository(UserEntity).findOne({ where: { username } }) : null;
    const created = await notify.contacts.createContact(SYSTEM_ACTOR, contactInput.parse({ ...contact, userId: user?.id ?? null }));
    ids.set(username ?? "night", created.id);
  }
  const partnerIds: number[] = [];
  for (const partner of PARTNERS) partnerIds.push((await notify.contacts.createContact(SYSTEM_ACTOR, contactInput.parse(partner))).id);
  const group = await notify.contacts.createGroup(SYSTEM_ACTOR, groupInput.parse({ name: "Partners (demo)", description: "Invented outside partners who receive short messages about the zones they care about.", contactIds: partnerIds }));

  // Twelve-hour shifts on the hour, the current one started four hours ago: the day shift covers the
  // demo afternoon, the night shift follows, and the shift before it shows as history.
  const dayStart = Math.floor(now.getTime() / HOUR) * HOUR - 4 * HOUR;
  const shifts = [
    { who: "night", role: "forecaster", from: dayStart - 12 * HOUR, hours: 12 },
    { who: "lead", role: "lead", from: dayStart - 12 * HOUR, hours: 12 },
    { who: "forecaster", role: "forecaster", from: dayStart, hours: 12 },
    { who: "lead", role: "lead", from: dayStart, hours: 12 },
    { who: "night", role: "forecaster", from: dayStart + 12 * HOUR, hours: 12 },
    { who: "lead", role: "lead", from: dayStart + 12 * HOUR, hours: 12 },
  ] as const;
  for (const s of shifts) {
    await notify.onCall.create(
      SYSTEM_ACTOR,
      shiftInput.parse({ contactId: ids.get(s.who)!, role: s.role, startsAt: new Date(s.from).toISOString(), endsAt: new Date(s.from + s.hours * HOUR).toISOString(), note: "Demo schedule" }),
    );
  }
  await notify.settings.update(SYSTEM_ACTOR, { templates: DEFAULT_TEMPLATES, escalationContactId: ids.get("manager")! });
  return { partnerGroupId: group.id };
}
