import { describe, expect, it } from "vitest";
import { NAV_ITEMS, navItem, navItemsFor } from "../../../src/config/navigation.ts";
import { loginPathFor, safeNextPath } from "../../../src/config/paths.ts";

const labels = (roles: Parameters<typeof navItemsFor>[0]) => navItemsFor(roles).map((item) => item.label);

describe("navItemsFor", () => {
  // Expected menus follow the permission table in shared/auth/permissions.ts (the project's own policy).
  it("shows each role only what the permission table allows", () => {
    expect(labels(["forecaster"])).toEqual(["Timeline", "Overview", "Grids", "Soundings", "Rules", "Zones", "Notifications"]);
    expect(labels(["lead", "forecaster"])).toEqual(["Timeline", "Overview", "Grids", "Soundings", "Rules", "Zones", "Notifications", "Verification"]);
    expect(labels(["manager"])).toEqual(["Timeline", "Overview", "Grids", "Soundings", "Rules", "Zones", "Notifications", "History", "Verification", "Audit trail"]);
    expect(labels(["admin"])).toEqual(["Timeline", "Overview", "Grids", "Soundings", "Rules", "Zones", "Notifications", "Accounts", "History", "Verification", "Audit trail"]);
  });

  it("shows nothing to an account without roles", () => {
    expect(navItemsFor([])).toEqual([]);
  });

  it("gives every item a distinct path and shortcut letter", () => {
    expect(new Set(NAV_ITEMS.map((i) => i.path)).size).toBe(NAV_ITEMS.length);
    expect(new Set(NAV_ITEMS.map((i) => i.shortcut)).size).toBe(NAV_ITEMS.length);
    for (const item of NAV_ITEMS) expect(item.shortcut).toMatch(/^[a-z]$/);
    // "g" starts every chord, so it cannot also end one.
    expect(NAV_ITEMS.map((i): string => i.shortcut)).not.toContain("g");
  });

  it("finds an item by id", () => {
    expect(navItem("audit").permission).toBe("audit.read");
    expect(navItem("accounts").path).toBe("/admin/accounts");
  });
});

describe("safeNextPath", () => {
  it("keeps same-site paths with their query", () => {
    expect(safeNextPath("/audit?page=2&actor=admin")).toBe("/audit?page=2&actor=admin");
  });

  it("refuses anything that could leave the site, falling back to the overview", () => {
    expect(safeNextPath("https://example.test/")).toBe("/");
    expect(safeNextPath("//example.test/")).toBe("/");
    expect(safeNextPath("/\\example.test")).toBe("/");
    expect(safeNextPath("audit")).toBe("/");
    expect(safeNextPath(null)).toBe("/");
  });

  it("never sends a signed-in user back to the sign-in page", () => {
    expect(safeNextPath("/login")).toBe("/");
    expect(safeNextPath("/login?next=/audit")).toBe("/");
  });
});

describe("loginPathFor", () => {
  it("remembers where the user was going", () => {
    expect(loginPathFor("/audit?page=2")).toBe("/login?next=%2Faudit%3Fpage%3D2");
  });

  it("adds nothing for the overview", () => {
    expect(loginPathFor("/")).toBe("/login");
  });
});
