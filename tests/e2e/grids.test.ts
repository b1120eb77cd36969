import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { afterAll, beforeAll, beforeEach, describe, expect, it, onTestFailed } from "vitest";
import type { Browser, BrowserContext, Page } from "playwright-core";
import { writeDemoRun } from "../../server/demo/demo-run.ts";
import { launchBrowser, screenshot } from "./helpers/browser.ts";
import { startE2eServer, E2E_PASSWORD, submitFromInbox } from "./helpers/server.ts";
import { signInThroughPage } from "./helpers/sign-in.ts";

/**
 * The Grids page and the map viewer in a real browser: two forecast hours of the invented demo
 * run arrive (one uploaded through the page, one through the inbox path of the ingest service),
 * the page follows their jobs live to "Ready", and the map shows MLCAPE with its legend, reads a
 * value under the pointer, steps between valid times and opens the sounding at a clicked point.
 */

let server: Awaited<ReturnType<typeof startE2eServer>>;
let chromium: Awaited<ReturnType<typeof launchBrowser>>;
let browser: Browser;
let context: BrowserContext;
let page: Page;
let demoFiles: string[];
let demoDir: string;
const pageErrors: string[] = [];

beforeAll(async () => {
  server = await startE2eServer({ DEMO_GRIDS: "false" });
  demoDir = fs.mkdtempSync(path.join(os.tmpdir(), "bellwether-e2e-demo-"));
  demoFiles = writeDemoRun(demoDir, { runTime: new Date("2026-05-14T12:00:00Z"), forecastHours: [1, 2] });
  chromium = await launchBrowser();
  browser = chromium.browser;
  // The invented office sits on the plains: local time beside UTC is US Central.
  context = await browser.newContext({ viewport: { width: 1440, height: 960 }, timezoneId: "America/Chicago" });
  page = await context.newPage();
  page.on("pageerror", (error) => pageErrors.push(error.message));
});
afterAll(async () => {
  await context?.close();
  await chromium?.close();
  await server?.close();
  if (demoDir) fs.rmSync(demoDir, { recursive: true, force: true });
});

/** Records, inside the page, every progress percentage any progress bar showed, so a brief one is not missed. */
async function watchProgressBars(target: Page): Promise<void> {
  await target.evaluate(() => {
    const seen: number[] = [];
    (window as unknown as { progressSeen: number[] }).progressSeen = seen;
    const record = () => {
      for (const bar of document.querySelectorAll('[role="progressbar"]')) seen.push(Number(bar.getAttribute("aria-valuenow")));
    };
    new MutationObserver(record).observe(document.body, { subtree: true, childList: true, attributes: true, attributeFilter: ["aria-valuenow"] });
  });
}

/** A panel of the page, found by its heading. */
const panel = (target: Page, title: string) => target.locator("section", { has: target.getByRole("heading", { name: title, exact: true }) });

describe("grids and the map in a real browser", () => {
  beforeEach((context) => {
    // The page as it was when a step failed, for whoever reads the failure.
    onTestFailed(async () => {
      await screenshot(page, `grids-error-at-${context.task.name.slice(0, 40).replace(/\W+/g, "-")}`);
      if (pageErrors.length > 0) console.error("Errors in the page:", pageErrors);
    });
  });

  it("shows the inbox explanation while nothing has arrived", async () => {
    await signInThroughPage(page, server.url, "forecaster", E2E_PASSWORD);
    await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Grids" }).click();
    await page.getByRole("heading", { name: "Grids", level: 1 }).waitFor();
    await page.getByText("No model files yet").waitFor();
    expect(await page.getByText("INBOX_DIR").count()).toBeGreaterThan(0);
    await screenshot(page, "grids-empty");
  });

  it("follows an uploaded file and an inbox file live until both are ready", async () => {
    await watchProgressBars(page);
    await page.getByText("Live", { exact: true }).waitFor();
    // One file through the page's own upload control, as a forecaster would.
    await page.getByLabel("Upload grid files…").setInputFiles(demoFiles[0]!);
    await page.getByText(`${path.basename(demoFiles[0]!)} received`).waitFor();
    // The other as if it had landed in the inbox folder.
    await submitFromInbox(server, demoFiles[1]!);

    const jobs = panel(page, "Ingest jobs");
    await jobs.getByText("Diagnosing", { exact: true }).first().waitFor({ timeout: 60_000 });
    await screenshot(page, "grids-ingesting");
    await expect.poll(() => jobs.getByText("Ready", { exact: true }).count(), { timeout: 90_000 }).toBe(2);
    await expect.poll(() => page.getByRole("progressbar").count()).toBe(0);

    const seen = await page.evaluate(() => (window as unknown as { progressSeen: number[] }).progressSeen);
    // Progress was shown while running, and moved (the server reports stages between 2 % and 97 %).
    expect(seen.length).toBeGreaterThan(0);
    expect(Math.max(...seen)).toBeGreaterThan(Math.min(...seen));
    expect(await jobs.getByText("by forecaster").count()).toBe(1);
    expect(await jobs.getByText("2 frames stored").count() + (await jobs.getByText("1 frame stored").count())).toBe(2);

    const runs = panel(page, "Model runs");
    await runs.getByText("2026-05-14 12Z").waitFor();
    expect(await runs.getByRole("link", { name: /Open F0[12] of the 2026-05-14 12Z/ }).count()).toBe(2);
    await screenshot(page, "grids-ready");
  });

  it("shows why a broken file failed, and refuses a file that is not a grid at all", async () => {
    // The first 400 bytes of a real demo file: it starts like GRIB2, so it becomes a job, and then fails.
    const truncated = fs.readFileSync(demoFiles[0]!).subarray(0, 400);
    await page.getByLabel("Upload grid files…").setInputFiles({ name: "cut-short.grib2", mimeType: "application/octet-stream", buffer: truncated });
    const row = panel(page, "Ingest jobs").locator("tr", { hasText: "cut-short.grib2" });
    await row.getByText("Failed", { exact: true }).waitFor({ timeout: 60_000 });
    // The decoder's own words reach the page: the message declares more bytes than the file holds.
    await expect.poll(() => row.textContent()).toMatch(/truncated: the message declares \d+ bytes but only \d+ remain/);

    await page.getByLabel("Upload grid files…").setInputFiles({ name: "notes.txt", mimeType: "text/plain", buffer: Buffer.from("shift notes, not a grid") });
    await page.getByText("notes.txt was not accepted").waitFor();
    expect(await panel(page, "Ingest jobs").locator("tr", { hasText: "notes.txt" }).count()).toBe(0);
    await screenshot(page, "grids-failed-job");
  });

  it("draws MLCAPE with its legend, reads values under the pointer and steps valid times", async () => {
    // Clear the upload notes so the map screenshots show the map.
    const dismiss = page.getByRole("button", { name: /^Dismiss:/ });
    while ((await dismiss.count()) > 0) await dismiss.first().click();
    await page.getByRole("link", { name: /Open F01 of the 2026-05-14 12Z/ }).click();
    await page.waitForURL(/\/grids\/frames\/\d+/);
    const firstFrameUrl = page.url();

    const picker = page.getByLabel("Field");
    await picker.selectOption("sbcin");
    await page.waitForURL(/field=sbcin/);
    await picker.selectOption("mlcape");
    await page.waitForURL(/field=mlcape/);
    const legend = page.getByRole("region", { name: "Legend" });
    await expect.poll(() => legend.textContent()).toContain("mlcape");
    expect(await legend.textContent()).toContain("J/kg");

    const map = page.getByRole("application", { name: /Map of mlcape/ });
    const box = (await map.boundingBox())!;
    expect(box.width).toBeGreaterThan(400);
    // The invented warm sector lies in the south of the domain: read a point there.
    await page.mouse.move(box.x + box.width * 0.45, box.y + box.height * 0.7);
    const readout = page.getByTestId("map-readout");
    await expect.poll(() => readout.textContent()).toMatch(/mlcape\s+[\d,]+ J\/kg/);
    const text = (await readout.textContent())!;
    expect(text).toMatch(/\d+\.\d\d° N, \d+\.\d\d° W/);
    expect(text).toMatch(/i \d+ · j \d+/);
    await screenshot(page, "map-mlcape");

    const contours = page.getByLabel("Contours");
    await contours.click();
    await page.waitForURL(/show=/);
    await expect.poll(() => contours.isChecked()).toBe(true);
    await page.mouse.move(box.x + box.width * 0.45, box.y + box.height * 0.7);
    await screenshot(page, "map-mlcape-contours");

    await page.keyboard.press("]");
    await expect.poll(() => page.url()).not.toBe(firstFrameUrl);
    expect(page.url()).toContain("field=mlcape");
    await page.getByRole("heading", { name: /F02/, level: 1 }).waitFor();
    await page.keyboard.press("[");
    await page.getByRole("heading", { name: /F01/, level: 1 }).waitFor();
    expect(page.url().split("?")[0]).toBe(firstFrameUrl.split("?")[0]);
  });

  it("opens the sounding of a clicked map point", async () => {
    const map = page.getByRole("application", { name: /Map of mlcape/ });
    const box = (await map.boundingBox())!;
    await page.mouse.move(box.x + box.width * 0.5, box.y + box.height * 0.5);
    const readout = (await page.getByTestId("map-readout").textContent())!;
    const [, latText, lonText] = /(\d+\.\d\d)° N, (\d+\.\d\d)° W/.exec(readout)!;
    const frameId = /\/grids\/frames\/(\d+)/.exec(page.url())![1];

    await page.mouse.click(box.x + box.width * 0.5, box.y + box.height * 0.5);
    await page.waitForURL(/\/soundings\?/);
    const url = new URL(page.url());
    expect(url.searchParams.get("frame")).toBe(frameId);
    // The link carries the clicked cell's centre, which the readout showed rounded to 0.01°.
    expect(Number(url.searchParams.get("lat"))).toBeCloseTo(Number(latText), 1);
    expect(Number(url.searchParams.get("lon"))).toBeCloseTo(-Number(lonText), 1);
    await page.getByRole("heading", { name: "Soundings", level: 1 }).waitFor();
    // The Soundings page reads that model column and names it.
    await page.getByRole("heading", { name: "Bellwether demo model (invented) column, forecast hour 1", level: 2 }).waitFor();
    await screenshot(page, "map-click-sounding");
    expect(pageErrors).toEqual([]);
  });
});
