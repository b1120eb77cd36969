import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Browser } from "playwright-core";
import { launchBrowser, screenshot } from "./helpers/browser.ts";
import { startE2eServer, E2E_PASSWORD } from "./helpers/server.ts";
import { signInThroughPage } from "./helpers/sign-in.ts";

let server: Awaited<ReturnType<typeof startE2eServer>>;
let chromium: Awaited<ReturnType<typeof launchBrowser>>;
let browser: Browser;

beforeAll(async () => {
  server = await startE2eServer();
  chromium = await launchBrowser();
  browser = chromium.browser;
});
afterAll(async () => {
  await chromium?.close();
  await server?.close();
});

/** What each demo role should find in the main navigation, and nothing more. */
const EXPECTED_NAV: Record<string, string[]> = {
  lead: ["Timeline", "Overview", "Grids", "Soundings", "Rules", "Zones", "Notifications", "Verification"],
  forecaster: ["Timeline", "Overview", "Grids", "Soundings", "Rules", "Zones", "Notifications"],
  manager: ["Timeline", "Overview", "Grids", "Soundings", "Rules", "Zones", "Notifications", "History", "Verification", "Audit trail"],
  admin: ["Timeline", "Overview", "Grids", "Soundings", "Rules", "Zones", "Notifications", "Accounts", "History", "Verification", "Audit trail"],
};

describe("sign-in in a real browser", () => {
  for (const [username, expected] of Object.entries(EXPECTED_NAV)) {
    it(`signs in as ${username}, sees only that role's navigation, and signs out`, async () => {
      const context = await browser.newContext();
      const page = await context.newPage();
      try {
        await signInThroughPage(page, server.url, username, E2E_PASSWORD);
        const nav = page.getByRole("navigation", { name: "Main" });
        await nav.waitFor();
        const labels = (await nav.getByRole("link").allInnerTexts()).map((t) => t.trim().split("\n")[0]!.trim());
        expect(labels).toEqual(expected);
        await screenshot(page, `signed-in-${username}`);
        await page.getByRole("button", { name: "Sign out" }).click();
        await page.waitForURL(/\/login/);
        await expect.poll(() => page.getByRole("button", { name: "Sign in" }).isVisible()).toBe(true);
      } finally {
        await context.close();
      }
    });
  }

  it("shows an error for a refused sign-in and stays on the sign-in page", async () => {
    const context = await browser.newContext();
    const page = await context.newPage();
    try {
      await signInThroughPage(page, server.url, "forecaster", "not-the-password");
      const alert = page.getByRole("alert").filter({ hasText: "not recognised" });
      await alert.waitFor();
      expect(page.url()).toContain("/login");
      await screenshot(page, "sign-in-refused");
    } finally {
      await context.close();
    }
  });

  it("shows the safety caution on the sign-in page", async () => {
    const page = await browser.newPage();
    try {
      await page.goto(`${server.url}/login`);
      await expect.poll(() => page.getByText("Official watches and warnings", { exact: false }).count()).toBeGreaterThan(0);
    } finally {
      await page.close();
    }
  });
});
