import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Browser, Page } from "playwright-core";
import { launchBrowser, screenshot } from "./helpers/browser.ts";
import { startE2eServer, E2E_PASSWORD } from "./helpers/server.ts";
import { signInThroughPage } from "./helpers/sign-in.ts";
import { insertOpenTrigger } from "../helpers/test-server.ts";
import { writeTransaction } from "../../server/db/data-source.ts";
import { TriggerEntity } from "../../server/entities/trigger.entity.ts";
import { RuleEntity } from "../../server/entities/rule.entity.ts";
import { createMailSender } from "../../server/notify/channels/mail-sender.ts";
import { renderMatchPng } from "../../server/notify/content/mask-png.ts";

/**
 * The delivery component on a trigger's page and the admin's fake inboxes, in a real browser,
 * against the demo office's contacts and on-call schedule. The trigger is written directly (the
 * engine's own path is tested in the API tests) and goes through the real outbox and fakes.
 */
let server: Awaited<ReturnType<typeof startE2eServer>>;
let chromium: Awaited<ReturnType<typeof launchBrowser>>;
let browser: Browser;
let triggerId: number;

beforeAll(async () => {
  server = await startE2eServer({ DEMO_GRIDS: "false", NOTIFY_POLL_SECONDS: "0.5" });
  chromium = await launchBrowser();
  browser = chromium.browser;
  const rule = (await server.dataSource.getRepository(RuleEntity).find({ order: { id: "ASC" } })).find((r) => r.name === "Supercell ingredients")!;
  triggerId = await insertOpenTrigger(server, rule.id, 1);
  await writeTransaction(server.dataSource, async (m) => server.services.notify.notifier.onTriggerChange(m, await m.getRepository(TriggerEntity).findOneByOrFail({ id: triggerId }), "opened"));
  await server.services.notify.dispatcher.settle();
  // This trigger has no stored frame, so its e-mail carries no map; one more e-mail with a drawn map
  // checks that the inbox page shows attached images.
  const zone = new Uint8Array(100).map((_, k) => (k % 10 > 2 && k % 10 < 7 && k > 30 && k < 70 ? 1 : 0));
  const matched = zone.map((v, k) => (v && k % 10 === 4 ? 1 : 0));
  const sender = createMailSender({ host: "127.0.0.1", port: server.services.notify.fakes.mail.address!.port, secure: false, from: "check@example.test", plainText: true }, "fake");
  await sender.send({
    to: "admin@example.test",
    subject: "Map image check",
    text: "A drawn map",
    html: '<p><img src="cid:map@check"></p>',
    attachments: [{ filename: "trigger-map.png", content: renderMatchPng({ nx: 10, ny: 10, zone, matched, matchColour: "#6E5394" }), contentType: "image/png", cid: "map@check" }],
    messageId: "<map-check@example.test>",
    triggerIds: [],
  });
  await sender.close();
});
afterAll(async () => {
  await chromium?.close();
  await server?.close();
});

/** Signs in, waits until the app has left the sign-in page, then opens `path`. */
async function signInAndOpen(page: Page, username: string, path: string): Promise<void> {
  await signInThroughPage(page, server.url, username, E2E_PASSWORD);
  await page.waitForURL((url) => !url.pathname.startsWith("/login"));
  await page.getByRole("navigation", { name: "Main" }).waitFor();
  await page.goto(`${server.url}${path}`);
}

describe("notifications in a real browser", () => {
  it("shows a forecaster who was told about a trigger, how, and with which result", async () => {
    const context = await browser.newContext({ viewport: { width: 1400, height: 1000 } });
    const page = await context.newPage();
    try {
      await signInAndOpen(page, "forecaster", `/triggers/${triggerId}`);
      const table = page.getByTestId("trigger-deliveries");
      await table.waitFor();
      // The demo day shift: the forecaster on shift, plus the invented partner group of this rule.
      await expect.poll(() => table.getByRole("listitem").count()).toBeGreaterThan(3);
      const text = await table.innerText();
      expect(text).toContain("Tobin Achterberg (demo forecaster)");
      expect(text).toContain("Hollis Brandvold (demo emergency manager)");
      expect(text).toContain("Text message");
      expect(text).toContain("Sent");
      expect(text).not.toContain("Failed");
      await screenshot(page, "trigger-deliveries");
    } finally {
      await context.close();
    }
  });

  it("shows an administrator the messages in the fake inboxes, with the map image", async () => {
    const context = await browser.newContext({ viewport: { width: 1400, height: 1100 } });
    const page = await context.newPage();
    try {
      await signInAndOpen(page, "admin", "/notifications");
      await page.getByRole("tab", { name: "Fake inboxes" }).click();
      const mail = page.getByTestId("fake-mail-list");
      await mail.getByText("New trigger: Supercell ingredients").first().waitFor();
      await mail.locator("summary", { hasText: "Map image check" }).click();
      const image = mail.getByRole("img", { name: /Map attached to “Map image check”/ });
      await image.waitFor();
      await expect.poll(() => image.evaluate((img) => (img as HTMLImageElement).naturalWidth)).toBeGreaterThan(50);
      const sms = page.getByTestId("fake-sms-list");
      await expect.poll(() => sms.getByRole("listitem").count()).toBeGreaterThan(0);
      expect(await sms.innerText()).toContain(`/triggers/${triggerId}`);
      await screenshot(page, "fake-inboxes");
    } finally {
      await context.close();
    }
  });

  it("shows everyone who is on shift now, and lets a lead open the contacts", async () => {
    const context = await browser.newContext({ viewport: { width: 1400, height: 1000 } });
    const page = await context.newPage();
    try {
      await signInAndOpen(page, "lead", "/notifications");
      const now = page.getByTestId("on-shift-now");
      await now.waitFor();
      expect(await now.innerText()).toContain("Tobin Achterberg (demo forecaster)");
      await screenshot(page, "on-call");
      await page.getByRole("tab", { name: "Contacts" }).click();
      await page.getByRole("button", { name: "New contact" }).waitFor();
      await page.getByRole("button", { name: "New contact" }).click();
      await page.getByLabel("Name").fill("Browser test partner");
      await page.getByLabel("Mobile (E.164)").fill("555-0100");
      await page.getByRole("checkbox", { name: "E-mail" }).uncheck();
      await page.getByRole("checkbox", { name: "Text message" }).check();
      await page.getByRole("button", { name: "Add contact" }).click();
      await page.getByText("Give the mobile number in international form").waitFor();
      await page.getByLabel("Mobile (E.164)").fill("+15550100177");
      await page.getByRole("button", { name: "Add contact" }).click();
      await page.getByRole("row", { name: /Browser test partner/ }).waitFor();
      expect(await page.getByRole("row", { name: /Browser test partner/ }).innerText()).toContain("+15550100177");
      await screenshot(page, "contacts");
    } finally {
      await context.close();
    }
  });
});
