import { describe, expect, it } from "vitest";
import { contactInput, notifySettingsInput, shiftInput, DEFAULT_TEMPLATES } from "../../../shared/api/notifications.ts";

const messages = (result: { success: boolean; error?: { issues: Array<{ path: PropertyKey[]; message: string }> } }) =>
  (result.error?.issues ?? []).map((i) => `${i.path.join(".")}: ${i.message}`);

describe("contact input", () => {
  it("accepts an E.164 mobile written with spaces and dashes, and stores it compact", () => {
    const parsed = contactInput.parse({ name: "Partner", mobile: "+1 555-010 0123", channels: ["sms"] });
    expect(parsed.mobile).toBe("+15550100123");
  });

  it("refuses numbers that are not E.164", () => {
    // Source: ITU-T E.164 (11/2010), sec. 6: at most 15 digits, country code first (no leading 0).
    for (const bad of ["5550100123", "+05550100123", "+1234567890123456"]) {
      expect(messages(contactInput.safeParse({ name: "X", mobile: bad, channels: ["sms"] })).join()).toContain("international form");
    }
  });

  it("needs an address for every preferred channel", () => {
    expect(messages(contactInput.safeParse({ name: "X", channels: ["email", "sms"] }))).toEqual([
      "email: E-mail is a preferred channel, so give an e-mail address",
      "mobile: Text is a preferred channel, so give a mobile number",
    ]);
  });

  it("checks quiet hours and their time zone", () => {
    const base = { name: "X", email: "x@example.test" };
    expect(messages(contactInput.safeParse({ ...base, quietHours: { start: "25:00", end: "06:00", timeZone: "America/Chicago" } })).join()).toContain("HH:MM");
    expect(messages(contactInput.safeParse({ ...base, quietHours: { start: "22:00", end: "06:00", timeZone: "Mars/Olympus" } })).join()).toContain("Unknown time zone");
    expect(messages(contactInput.safeParse({ ...base, quietHours: { start: "22:00", end: "22:00", timeZone: "UTC" } })).join()).toContain("different start and end");
  });
});

describe("shift input", () => {
  it("normalises times to UTC and refuses a shift that ends before it starts", () => {
    expect(shiftInput.parse({ contactId: 1, role: "lead", startsAt: "2026-05-14T08:00:00-05:00", endsAt: "2026-05-14T20:00:00-05:00" }).startsAt).toBe("2026-05-14T13:00:00.000Z");
    expect(messages(shiftInput.safeParse({ contactId: 1, role: "lead", startsAt: "2026-05-14T20:00:00Z", endsAt: "2026-05-14T08:00:00Z" }))).toEqual(["endsAt: A shift must end after it starts"]);
  });
});

describe("office templates", () => {
  it("accept the defaults", () => {
    expect(notifySettingsInput.safeParse({ templates: DEFAULT_TEMPLATES, escalationContactId: null }).success).toBe(true);
  });

  it("name an unknown placeholder and insist that texts carry the link", () => {
    const result = notifySettingsInput.safeParse({ templates: { ...DEFAULT_TEMPLATES, emailSubject: "{rule} {colour}", smsText: "{rule} only" }, escalationContactId: null });
    expect(messages(result)).toEqual([
      expect.stringMatching(/^templates\.emailSubject: Unknown placeholder \{colour\}/),
      "templates.smsText: Text messages must carry the {link} to the trigger",
    ]);
  });
});
