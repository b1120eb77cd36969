import { z } from "zod";
import { SEVERITY_KEYS } from "../rules/severity.ts";
import { isKnownTimeZone, minutesOfClock } from "../notify/quiet-hours.ts";
import { checkTemplate } from "../notify/template.ts";

/** How a message travels. */
export const CHANNELS = ["email", "sms"] as const;
export type Channel = (typeof CHANNELS)[number];
export const CHANNEL_LABELS: Record<Channel, string> = { email: "E-mail", sms: "Text message" };

/** Roles a person can hold on an on-call shift: the lead is the first escalation level. */
export const SHIFT_ROLES = ["forecaster", "lead"] as const;
export type ShiftRole = (typeof SHIFT_ROLES)[number];

/** Why a notification was written. */
export const NOTIFY_CHANGES = ["opened", "severity-rose", "escalated", "digest"] as const;
export type NotifyChange = (typeof NOTIFY_CHANGES)[number];

/**
 * Outbox states. held: waiting for the contact's quiet hours to end; digested: carried by a digest
 * instead; queued → sending → sent, or back to queued for a retry, or failed for good.
 */
export const NOTIFICATION_STATES = ["held", "digested", "queued", "sending", "sent", "failed"] as const;
export type NotificationState = (typeof NOTIFICATION_STATES)[number];

export const ATTEMPT_OUTCOMES = ["started", "sent", "retry", "failed", "interrupted"] as const;
export type AttemptOutcome = (typeof ATTEMPT_OUTCOMES)[number];

const clock = z
  .string()
  .trim()
  .refine((v) => {
    try {
      minutesOfClock(v);
      return true;
    } catch {
      return false;
    }
  }, "Use a 24-hour time as HH:MM, e.g. 22:00");

export const timeZoneSchema = z.string().trim().min(1, "Name a time zone").refine(isKnownTimeZone, "Unknown time zone; use an IANA name such as America/Chicago");

export const quietHoursSchema = z
  .object({ start: clock, end: clock, timeZone: timeZoneSchema })
  .refine((q) => q.start !== q.end, { message: "Quiet hours need different start and end times", path: ["end"] });

/** E.164: a plus, a country code that does not start with 0, at most 15 digits in all. */
export const E164_PATTERN = /^\+[1-9]\d{6,14}$/;
const mobile = z
  .string()
  .trim()
  .transform((v) => v.replace(/[\s().-]/g, ""))
  .refine((v) => E164_PATTERN.test(v), "Give the mobile number in international form, e.g. +15550100123");
const email = z.string().trim().toLowerCase().pipe(z.email("Give a valid e-mail address"));

const contactFields = {
  name: z.string().trim().min(1, "Give the contact a name").max(120),
  /** What the contact is to the office: staff, or an outside partner who never signs in. */
  organisation: z.string().trim().max(120).default(""),
  email: email.nullable().default(null),
  mobile: mobile.nullable().default(null),
  channels: z
    .array(z.enum(CHANNELS))
    .max(2)
    .refine((list) => new Set(list).size === list.length, "Each channel may be listed once")
    .default(["email"]),
  quietHours: quietHoursSchema.nullable().default(null),
  userId: z.number().int().positive().nullable().default(null),
  active: z.boolean().default(true),
};

type ContactShape = { email: string | null; mobile: string | null; channels: Channel[] };
const channelsHaveAddresses = (c: ContactShape, ctx: z.RefinementCtx) => {
  if (c.channels.includes("email") && !c.email) ctx.addIssue({ code: "custom", path: ["email"], message: "E-mail is a preferred channel, so give an e-mail address" });
  if (c.channels.includes("sms") && !c.mobile) ctx.addIssue({ code: "custom", path: ["mobile"], message: "Text is a preferred channel, so give a mobile number" });
};

export const contactInput = z.object(contactFields).superRefine(channelsHaveAddresses);
export type ContactInput = z.input<typeof contactInput>;
export type ContactValues = z.infer<typeof contactInput>;

export const contactDto = z.object({
  id: z.number().int(),
  name: z.string(),
  organisation: z.string(),
  email: z.string().nullable(),
  mobile: z.string().nullable(),
  channels: z.array(z.enum(CHANNELS)),
  quietHours: z.object({ start: z.string(), end: z.string(), timeZone: z.string() }).nullable(),
  userId: z.number().int().nullable(),
  username: z.string().nullable(),
  active: z.boolean(),
  groupIds: z.array(z.number().int()),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type ContactDto = z.infer<typeof contactDto>;

export const groupInput = z.object({
  name: z.string().trim().min(1, "Give the group a name").max(120),
  description: z.string().trim().max(500).default(""),
  contactIds: z
    .array(z.number().int().positive())
    .max(500)
    .refine((list) => new Set(list).size === list.length, "Each contact may be listed once")
    .default([]),
});
export type GroupInput = z.input<typeof groupInput>;
export type GroupValues = z.infer<typeof groupInput>;

export const groupDto = z.object({
  id: z.number().int(),
  name: z.string(),
  description: z.string(),
  contactIds: z.array(z.number().int()),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type GroupDto = z.infer<typeof groupDto>;

const instant = z.iso.datetime({ offset: true, error: "Give an ISO time, e.g. 2026-05-02T18:00:00Z" }).transform((v) => new Date(v).toISOString());

export const shiftInput = z
  .object({
    contactId: z.number().int().positive(),
    role: z.enum(SHIFT_ROLES),
    startsAt: instant,
    endsAt: instant,
    note: z.string().trim().max(200).default(""),
  })
  .refine((s) => s.startsAt < s.endsAt, { message: "A shift must end after it starts", path: ["endsAt"] })
  .refine((s) => Date.parse(s.endsAt) - Date.parse(s.startsAt) <= 7 * 86_400_000, { message: "A shift lasts at most 7 days", path: ["endsAt"] });
export type ShiftInput = z.input<typeof shiftInput>;
export type ShiftValues = z.infer<typeof shiftInput>;

export const shiftDto = z.object({
  id: z.number().int(),
  contactId: z.number().int(),
  contactName: z.string(),
  role: z.enum(SHIFT_ROLES),
  startsAt: z.string(),
  endsAt: z.string(),
  note: z.string(),
});
export type ShiftDto = z.infer<typeof shiftDto>;

export const shiftsQuery = z
  .object({ from: z.iso.datetime({ offset: true }).optional(), to: z.iso.datetime({ offset: true }).optional() })
  .refine((q) => !q.from || !q.to || q.from < q.to, { message: "from must be before to", path: ["to"] });

/** The templates an office can word its own way, and the placeholders each understands. */
export const TEMPLATE_PLACEHOLDERS = {
  emailSubject: ["change", "rule", "severity", "zone", "zoneCode", "validUtc", "validLocal", "model", "run", "level"],
  emailIntro: ["change", "rule", "severity", "zone", "zoneCode", "validUtc", "validLocal", "model", "run", "level"],
  smsText: ["change", "rule", "severity", "zone", "zoneCode", "validUtc", "validLocal", "model", "run", "level", "link"],
  digestSubject: ["count", "contact"],
} as const;
export type TemplateKey = keyof typeof TEMPLATE_PLACEHOLDERS;
export const TEMPLATE_KEYS = Object.keys(TEMPLATE_PLACEHOLDERS) as TemplateKey[];

export const DEFAULT_TEMPLATES: Record<TemplateKey, string> = {
  emailSubject: "[Bellwether] {change}: {rule} ({severity}) in {zone}",
  emailIntro: "{change}: the rule \"{rule}\" matched in {zone} at {severity} level, valid {validUtc} ({validLocal}).",
  smsText: "Bellwether {change}: {rule}, {severity}, {zoneCode} {zone}, valid {validUtc}. {link}",
  digestSubject: "[Bellwether] {count} heads-up trigger(s) held during your quiet hours",
};

const templateText = (key: TemplateKey, max: number) =>
  z
    .string()
    .max(max, `At most ${max} characters`)
    .refine((v) => v.trim().length > 0, "Write the template (it may not be empty)")
    .superRefine((value, ctx) => {
      for (const problem of checkTemplate(value, TEMPLATE_PLACEHOLDERS[key])) ctx.addIssue({ code: "custom", message: problem.message, params: { position: problem.position } });
    });

export const notifySettingsInput = z.object({
  templates: z.object({
    emailSubject: templateText("emailSubject", 200),
    emailIntro: templateText("emailIntro", 1000),
    smsText: templateText("smsText", 300).refine((v) => v.includes("{link}"), "Text messages must carry the {link} to the trigger"),
    digestSubject: templateText("digestSubject", 200),
  }),
  /** The last escalation level: a named contact (e.g. the meteorologist in charge). */
  escalationContactId: z.number().int().positive().nullable(),
});
export type NotifySettingsInput = z.infer<typeof notifySettingsInput>;

export const notifySettingsDto = notifySettingsInput.extend({
  /** Office defaults from the environment, shown read-only. */
  escalationMinutes: z.number(),
  officeTimeZone: z.string(),
  mailTransport: z.enum(["fake", "smtp"]),
  smsTransport: z.enum(["fake", "provider"]),
});
export type NotifySettingsDto = z.infer<typeof notifySettingsDto>;

export const deliveryAttemptDto = z.object({
  attempt: z.number().int(),
  outcome: z.enum(ATTEMPT_OUTCOMES),
  startedAt: z.string(),
  finishedAt: z.string().nullable(),
  providerMessageId: z.string().nullable(),
  error: z.string().nullable(),
});
export type DeliveryAttemptDto = z.infer<typeof deliveryAttemptDto>;

export const notificationDto = z.object({
  id: z.number().int(),
  triggerId: z.number().int().nullable(),
  change: z.enum(NOTIFY_CHANGES),
  level: z.number().int().nullable(),
  channel: z.enum(CHANNELS),
  contactId: z.number().int().nullable(),
  recipientName: z.string(),
  address: z.string(),
  severity: z.enum(SEVERITY_KEYS),
  state: z.enum(NOTIFICATION_STATES),
  attempts: z.number().int(),
  nextAttemptAt: z.string().nullable(),
  heldUntil: z.string().nullable(),
  digestId: z.number().int().nullable(),
  providerMessageId: z.string().nullable(),
  lastError: z.string().nullable(),
  createdAt: z.string(),
  sentAt: z.string().nullable(),
  /** Triggers a digest carries (a single-trigger message lists its own). */
  triggerIds: z.array(z.number().int()),
  attemptLog: z.array(deliveryAttemptDto),
});
export type NotificationDto = z.infer<typeof notificationDto>;

export const notificationsQuery = z.object({
  triggerId: z.coerce.number().int().positive().optional(),
  state: z.enum(NOTIFICATION_STATES).optional(),
  limit: z.coerce.number().int().min(1).max(500).default(100),
});
export type NotificationsQuery = z.infer<typeof notificationsQuery>;

/** What the local fakes received, newest first (`GET /api/fakes/mail`, `GET /api/fakes/sms`). */
export const fakeMailDto = z.object({
  id: z.number().int(),
  receivedAt: z.string(),
  messageId: z.string().nullable(),
  from: z.string(),
  to: z.array(z.string()),
  subject: z.string(),
  text: z.string(),
  html: z.string().nullable(),
  attachments: z.array(z.object({ filename: z.string().nullable(), contentType: z.string(), size: z.number().int(), inline: z.boolean() })),
  triggerId: z.number().int().nullable(),
  triggerIds: z.array(z.number().int()),
});
export type FakeMailDto = z.infer<typeof fakeMailDto>;

export const fakeSmsDto = z.object({
  id: z.string(),
  receivedAt: z.string(),
  from: z.string(),
  to: z.array(z.string()),
  body: z.string(),
  triggerId: z.number().int().nullable(),
  triggerIds: z.array(z.number().int()),
});
export type FakeSmsDto = z.infer<typeof fakeSmsDto>;

/** How a fake misbehaves (for tests and demonstrations). */
export const fakeBehaviourSchema = z.object({
  /** Share of requests refused, 0 to 1. */
  failureRate: z.number().min(0).max(1),
  /** Refuse only after storing the message, as if the reply were lost on the way back. */
  failAfterStoring: z.boolean(),
  /** Extra wait before answering, in milliseconds. */
  delayMs: z.number().int().min(0).max(60_000),
});
export type FakeBehaviour = z.infer<typeof fakeBehaviourSchema>;

export const fakeStatusDto = z.object({
  running: z.boolean(),
  address: z.string().nullable(),
  received: z.number().int(),
  duplicatesIgnored: z.number().int(),
  refused: z.number().int(),
  behaviour: fakeBehaviourSchema,
});
export type FakeStatusDto = z.infer<typeof fakeStatusDto>;

export const fakesStatusDto = z.object({ mail: fakeStatusDto, sms: fakeStatusDto });
export type FakesStatusDto = z.infer<typeof fakesStatusDto>;

export const fakesBehaviourInput = z.object({ mail: fakeBehaviourSchema.partial().optional(), sms: fakeBehaviourSchema.partial().optional() });
export type FakesBehaviourInput = z.infer<typeof fakesBehaviourInput>;
