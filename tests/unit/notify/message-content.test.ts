import { describe, expect, it } from "vitest";
import { decode as decodePng } from "fast-png";
import { fitSms, SMS_MAX_LENGTH, triggerSms } from "../../../server/notify/content/sms-message.ts";
import { renderMatchPng, zoneWindow } from "../../../server/notify/content/mask-png.ts";
import { triggerEmail } from "../../../server/notify/content/email-message.ts";
import { localSpan, utcSpan, displayValue } from "../../../server/notify/content/format-facts.ts";
import type { TriggerFacts } from "../../../server/notify/content/trigger-facts.ts";
import { retryDelayMs } from "../../../server/notify/retry-policy.ts";
import { DEFAULT_TEMPLATES } from "../../../shared/api/notifications.ts";
import { SAFETY_CAUTION } from "../../../shared/caution.ts";

const LINK = "https://bellwether.example.test/triggers/12345";
const facts = (over: Partial<TriggerFacts> = {}): TriggerFacts => ({
  triggerId: 12345,
  change: "New trigger",
  rule: "Supercell ingredients",
  severity: "serious",
  severityLabel: "Serious",
  severityColour: "#6E5394",
  zone: "Upper Cimarron <west>",
  zoneCode: "UCW",
  validUtc: "2026-05-14 18:00Z to 21:00Z",
  validLocal: "Thu 14 May 13:00 CDT to Thu 14 May 16:00 CDT",
  model: "demo-12km",
  run: "2026-05-14 12Z",
  level: "",
  coverage: "23 % of the zone (41 point(s))",
  peak: ["mlcape: 1,020 to 2,340 J/kg"],
  link: LINK,
  state: "open",
  ...over,
});

describe("text messages", () => {
  it("keep short texts as they are", () => {
    expect(fitSms(`Short ${LINK}`, LINK)).toBe(`Short ${LINK}`);
  });

  it("shorten the words, never the link, to fit two segments", () => {
    const long = `${"A very long rule name that goes on ".repeat(20)} ${LINK}`;
    const fitted = fitSms(long, LINK);
    expect(fitted.length).toBeLessThanOrEqual(SMS_MAX_LENGTH);
    expect(fitted.endsWith(`... ${LINK}`)).toBe(true);
    // Common practice (no source): two concatenated 7-bit segments carry 2 x 160 characters.
    expect(SMS_MAX_LENGTH).toBe(320);
  });

  it("fill the office template and carry the link", () => {
    const text = triggerSms(facts({ rule: "R".repeat(400) }), DEFAULT_TEMPLATES);
    expect(text.length).toBeLessThanOrEqual(320);
    expect(text).toContain(LINK);
  });
});

describe("e-mail", () => {
  it("has the caution and the link in both parts, and escapes names in the HTML", () => {
    const mail = triggerEmail(facts(), DEFAULT_TEMPLATES, true);
    expect(mail.subject).toBe("[Bellwether] New trigger: Supercell ingredients (Serious) in Upper Cimarron <west>");
    expect(mail.text).toContain(SAFETY_CAUTION);
    expect(mail.text).toContain(LINK);
    expect(mail.html).toContain("Upper Cimarron &lt;west&gt;");
    expect(mail.html).not.toContain("<west>");
    expect(mail.html).toContain("forecasters&#39; judgement");
    expect(mail.html).toContain(`href="${LINK}"`);
  });

  it("says so when there is no map", () => {
    const mail = triggerEmail(facts(), DEFAULT_TEMPLATES, false);
    expect(mail.html).not.toContain("cid:");
    expect(mail.text).toContain("No map could be drawn");
  });
});

describe("the matched-area map", () => {
  // A 10 x 8 grid; the zone is a 4 x 3 block in the north-east; two of its points matched.
  const nx = 10;
  const ny = 8;
  const zone = new Uint8Array(nx * ny);
  const matched = new Uint8Array(nx * ny);
  for (let j = 4; j < 7; j++) for (let i = 5; i < 9; i++) zone[j * nx + i] = 1;
  matched[5 * nx + 6] = 1;
  matched[5 * nx + 7] = 1;

  it("crops to the zone with a margin", () => {
    // Derived in closed form: zone i 5..8, j 4..6; margin max(3, round(0.2 x 4)) = 3, clamped to the grid.
    expect(zoneWindow(zone, nx, ny)).toEqual({ i0: 2, j0: 1, cols: 8, rows: 7 });
  });

  it("draws north up: surroundings, zone edge, and matched points in the given colour", () => {
    const png = decodePng(renderMatchPng({ nx, ny, zone, matched, matchColour: "#8F3A62", size: 80 }));
    // Derived in closed form: window 8 x 7 cells at 10 px per cell.
    expect([png.width, png.height]).toEqual([80, 70]);
    const pixel = (x: number, y: number) => Array.from(png.data.slice((y * png.width + x) * png.channels, (y * png.width + x) * png.channels + 3));
    // Cell (i, j) sits at x = (i - 2) * 10, y = (1 + 7 - 1 - j) * 10 (row 0 of the image is the north).
    const centre = (i: number, j: number) => pixel((i - 2) * 10 + 5, (7 - j) * 10 + 5);
    expect(centre(6, 5)).toEqual([0x8f, 0x3a, 0x62]);
    expect(centre(5, 4)).toEqual([94, 110, 128]); // zone corner: edge colour
    expect(centre(2, 1)).toEqual([242, 244, 247]); // outside the zone
  });

  it("refuses masks that do not fit the grid", () => {
    expect(() => renderMatchPng({ nx, ny, zone: new Uint8Array(5), matched: null, matchColour: "#000000" })).toThrow(/zone mask has 5 points/);
  });
});

describe("formatting and pacing", () => {
  it("writes valid times UTC first and in the office's zone", () => {
    expect(utcSpan("2026-05-14T18:00:00.000Z", "2026-05-14T21:00:00.000Z")).toBe("2026-05-14 18:00Z to 21:00Z");
    // 18:00Z is 13:00 CDT (UTC-5). Source: Energy Policy Act of 2005, sec. 110 (daylight time in May).
    expect(localSpan("2026-05-14T18:00:00.000Z", "2026-05-14T18:00:00.000Z", "America/Chicago")).toBe("Thu 14 May 13:00 CDT");
  });

  it("shows stored SI values in display units", () => {
    // Source: 1 kt = 1852 m / 3600 s (international nautical mile), so 20 m/s = 38.9 kt.
    expect(displayValue("shear_0_6km", 20)).toBe("39 kt");
    expect(displayValue("mlcape", 2340)).toBe("2,340 J/kg");
    expect(displayValue("mlcape", null)).toBe("n/a");
  });

  it("backs off exponentially up to a ceiling", () => {
    const policy = { maxAttempts: 6, baseDelayMs: 30_000, maxDelayMs: 600_000 };
    // Derived in closed form: 30 s x 2^(n - 1), capped at 600 s.
    expect([1, 2, 3, 4, 5, 6, 7].map((n) => retryDelayMs(policy, n) / 1000)).toEqual([30, 60, 120, 240, 480, 600, 600]);
  });
});
