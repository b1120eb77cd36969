import { describe, expect, it } from "vitest";
import { isInQuietHours, quietHoursEnd, zonedTimeToUtc } from "../../../shared/notify/quiet-hours.ts";

// US daylight saving time in 2026 runs from 8 March 02:00 to 1 November 02:00 local time; the US
// Central zone is UTC-6 in standard time and UTC-5 in daylight time.
// Source: Energy Policy Act of 2005, sec. 110 (second Sunday in March, first Sunday in November); 15 U.S.C. 260a.
const CHICAGO = "America/Chicago";
const overnight = { start: "22:00", end: "06:30", timeZone: CHICAGO };
const daytime = { start: "09:00", end: "17:00", timeZone: CHICAGO };

describe("quiet hours", () => {
  it("converts a Central wall-clock time to UTC in summer and in winter", () => {
    // Derived in closed form from the offsets above: 22:00 CDT = 03:00Z next day, 22:00 CST = 04:00Z next day.
    expect(zonedTimeToUtc(2026, 7, 1, 22 * 60, CHICAGO).toISOString()).toBe("2026-07-02T03:00:00.000Z");
    expect(zonedTimeToUtc(2026, 1, 15, 22 * 60, CHICAGO).toISOString()).toBe("2026-01-16T04:00:00.000Z");
  });

  it("holds a window that runs past midnight, start inclusive and end exclusive", () => {
    // Derived in closed form: 22:00 CDT on 1 July is 03:00Z on 2 July; 06:30 CDT is 11:30Z.
    expect(isInQuietHours(overnight, new Date("2026-07-02T02:59:00Z"))).toBe(false);
    expect(isInQuietHours(overnight, new Date("2026-07-02T03:00:00Z"))).toBe(true);
    expect(isInQuietHours(overnight, new Date("2026-07-02T11:29:00Z"))).toBe(true);
    expect(isInQuietHours(overnight, new Date("2026-07-02T11:30:00Z"))).toBe(false);
  });

  it("holds a window inside one day", () => {
    // Derived in closed form: 09:00-17:00 CST is 15:00Z-23:00Z in January.
    expect(isInQuietHours(daytime, new Date("2026-01-15T14:59:00Z"))).toBe(false);
    expect(isInQuietHours(daytime, new Date("2026-01-15T15:00:00Z"))).toBe(true);
    expect(isInQuietHours(daytime, new Date("2026-01-15T23:00:00Z"))).toBe(false);
  });

  it("says when the window ends, before and after local midnight", () => {
    // Derived in closed form: 06:30 CDT on 2 July = 11:30Z.
    expect(quietHoursEnd(overnight, new Date("2026-07-02T03:30:00Z"))?.toISOString()).toBe("2026-07-02T11:30:00.000Z");
    expect(quietHoursEnd(overnight, new Date("2026-07-02T09:00:00Z"))?.toISOString()).toBe("2026-07-02T11:30:00.000Z");
    expect(quietHoursEnd(overnight, new Date("2026-07-02T12:00:00Z"))).toBeNull();
  });

  it("ends at the local time even across the spring change to daylight time", () => {
    // Quiet from 22:00 CST on 7 March 2026 (04:00Z on 8 March); clocks go forward at 02:00, so
    // 06:30 local on 8 March is CDT, UTC-5: 11:30Z. Derived in closed form from the dates above.
    expect(quietHoursEnd(overnight, new Date("2026-03-08T05:00:00Z"))?.toISOString()).toBe("2026-03-08T11:30:00.000Z");
  });

  it("treats equal start and end as no quiet hours", () => {
    expect(isInQuietHours({ start: "08:00", end: "08:00", timeZone: "UTC" }, new Date("2026-07-02T08:00:00Z"))).toBe(false);
  });
});
