import { describe, expect, it } from "vitest";
import {
  formatClockLine,
  formatLocalBeside,
  formatLocalTime,
  formatTimestampLine,
  formatUtcClock,
  formatUtcDateTime,
  formatUtcTime,
  isoToUtcInput,
  utcInputToIso,
} from "../../../src/lib/time.ts";

// 2025-05-02T18:00:00Z; America/Chicago keeps daylight time (UTC−5) in May.
// Source: IANA tz database, zone America/Chicago (US daylight time from the second Sunday in March).
const SPRING_EVENING = "2025-05-02T18:00:00Z";
// 2025-01-15T03:07:09Z; America/Chicago is on standard time (UTC−6) in January. Source: IANA tz database.
const WINTER_NIGHT = "2025-01-15T03:07:09Z";

describe("UTC formatting", () => {
  it("writes times the way staff say them", () => {
    expect(formatUtcTime(SPRING_EVENING)).toBe("18:00Z"); // Common practice (no source): "18Z" style with minutes
    expect(formatUtcClock(WINTER_NIGHT)).toBe("03:07:09Z"); // Derived in closed form from the ISO string
    expect(formatUtcDateTime(WINTER_NIGHT)).toBe("2025-01-15 03:07Z"); // Derived in closed form from the ISO string
  });

  it("shows a dash for an unreadable time instead of 'NaN'", () => {
    expect(formatUtcTime("not a time")).toBe("—");
    expect(formatTimestampLine("")).toBe("—");
  });
});

describe("local time beside UTC", () => {
  const chicago = { timeZone: "America/Chicago" };

  it("uses the zone's short name and 24-hour time", () => {
    expect(formatLocalTime(SPRING_EVENING, chicago)).toBe("13:00 CDT"); // Source: IANA tz database, America/Chicago UTC−5 in May
    expect(formatLocalTime(WINTER_NIGHT, chicago)).toBe("21:07 CST"); // Source: IANA tz database, America/Chicago UTC−6 in January
  });

  it("names the weekday when the local day is not the UTC day", () => {
    expect(formatLocalBeside(SPRING_EVENING, chicago)).toBe("13:00 CDT");
    // 2025-01-15 03:07Z is the evening of Tuesday 14 January in Chicago. Source: IANA tz database; 2025-01-14 was a Tuesday (Gregorian calendar).
    expect(formatLocalBeside(WINTER_NIGHT, chicago)).toBe("Tue 21:07 CST");
  });

  it("puts UTC first in the clock and table lines", () => {
    expect(formatClockLine(WINTER_NIGHT, chicago)).toBe("03:07:09Z · 21:07 CST");
    expect(formatTimestampLine(SPRING_EVENING, { timeZone: "UTC" })).toBe("2025-05-02 18:00Z · 18:00 UTC");
  });
});

describe("UTC datetime-local inputs", () => {
  it("reads the input as UTC, whatever the browser's zone", () => {
    expect(utcInputToIso("2025-05-02T18:00")).toBe("2025-05-02T18:00:00.000Z");
    expect(utcInputToIso("2025-05-02T18:00:30")).toBe("2025-05-02T18:00:30.000Z");
  });

  it("rejects empty, malformed and impossible dates", () => {
    expect(utcInputToIso("")).toBeNull();
    expect(utcInputToIso("2025-05-02 18:00")).toBeNull();
    expect(utcInputToIso("2025-04-31T12:00")).toBeNull(); // Source: Gregorian calendar, April has 30 days
  });

  it("round-trips an ISO instant", () => {
    expect(isoToUtcInput("2025-05-02T18:00:00.000Z")).toBe("2025-05-02T18:00");
    expect(isoToUtcInput("2025-05-02T13:00:00-05:00")).toBe("2025-05-02T18:00");
    expect(isoToUtcInput(undefined)).toBe("");
  });
});
