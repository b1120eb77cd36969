import fs from "node:fs";
import path from "node:path";
import { afterAll, beforeAll, beforeEach, describe, expect, it, onTestFailed } from "vitest";
import type { Browser, BrowserContext, Page } from "playwright-core";
import { launchBrowser, screenshot, SCREENSHOT_DIR } from "./helpers/browser.ts";
import { startE2eServer, E2E_PASSWORD, submitFromInbox } from "./helpers/server.ts";
import { signInThroughPage } from "./helpers/sign-in.ts";
import { splitCsvRecords } from "../../shared/csv/csv-text.ts";
import { STORM_REPORT_CSV_HEADER } from "../../shared/storm-reports/storm-report-csv.ts";
import { HISTORY_CSV_HEADER } from "../../server/history/history-csv.ts";
import { AUDIT_CSV_HEADER } from "../../server/audit/audit-export.ts";
import { TriggerEntity } from "../../server/entities/trigger.entity.ts";
import { StormReportEntity } from "../../server/entities/storm-report.entity.ts";

/**
 * A manager's post-event review of the invented demo event, end to end in Chromium: the demo run
 * lands in the inbox and is ingested, its rules open triggers, the forecaster acknowledges some and
 * a lead saves a second version of one rule; then the manager reads the history (figures, filters,
 * sorting, a trigger's story), exports it as CSV, prints the event report, scores the rules against
 * the demo's invented storm reports (scores, charts, map), compares the two versions, loads a CSV
 * of reports, and exports the audit trail.
 */

let server: Awaited<ReturnType<typeof startE2eServer>>;
let chromium: Awaited<ReturnType<typeof launchBrowser>>;
let browser: Browser;
let context: BrowserContext;
let page: Page;
const pageErrors: string[] = [];

async function waitForFiles(folder: string, count: number, timeoutMs: number): Promise<string[]> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const files = fs.existsSync(folder) ? fs.readdirSync(folder).filter((f) => f.endsWith(".grib2")).sort() : [];
    if (files.length >= count) return files.map((f) => path.join(folder, f));
    if (Date.now() > deadline) throw new Error(`only ${files.length} of ${count} demo files appeared in ${folder}`);
    await new Promise((resolve) => setTimeout(resolve, 250));
  }
}

/** Calls the API as `username` through a context of its own (session cookie and CSRF token). */
async function asUser(username: string, work: (call: (method: "post" | "put", url: string, data: unknown) => Promise<number>) => Promise<void>) {
  const own = await browser.newContext();
  try {
    const login = await own.request.post(`${server.url}/api/auth/login`, { data: { username, password: E2E_PASSWORD } });
    expect(login.status()).toBe(200);
    const { token } = (await (await own.request.get(`${server.url}/api/auth/csrf`)).json()) as { token: string };
    await work(async (method, url, data) => (await own.request[method](`${server.url}${url}`, { data, headers: { "x-csrf-token": token } })).status());
  } finally {
    await own.close();
  }
}

async function downloadText(trigger: () => Promise<void>): Promise<{ name: string; text: string }> {
  const [download] = await Promise.all([page.waitForEvent("download"), trigger()]);
  const file = await download.path();
  return { name: download.suggestedFilename(), text: fs.readFileSync(file, "utf8") };
}

const nav = () => page.getByRole("navigation", { name: "Main" });

beforeAll(async () => {
  server = await startE2eServer();
  // The demo run is written into the inbox on start; with jobs off, feed it to the ingest service here.
  const files = await waitForFiles(server.config.inboxDir, 9, 120_000);
  for (const file of files) await submitFromInbox(server, file);
  await server.services.ingest.idle();
  await server.services.evaluation.idle();
  chromium = await launchBrowser();
  browser = chromium.browser;

  const triggers = await server.dataSource.getRepository(TriggerEntity).find({ order: { id: "ASC" } });
  expect(triggers.length).toBeGreaterThan(5);
  // Two triggers of the first starter rule and two of others acknowledged; one of another rule closed as a false alarm.
  const supercell = triggers.filter((t) => t.ruleId === 1);
  const others = triggers.filter((t) => t.ruleId !== 1);
  await asUser("forecaster", async (call) => {
    for (const t of [...supercell.slice(0, 2), ...others.slice(0, 2)]) expect(await call("post", `/api/triggers/${t.id}/acknowledge`, { note: "Watching the dryline" })).toBe(200);
  });
  await asUser("lead", async (call) => {
    expect(await call("post", `/api/triggers/${others.at(-1)!.id}/false-alarm`, { reason: "Capped all afternoon" })).toBe(200);
    // A second version of the first starter rule: a stricter shear threshold, to compare before switching.
    const versions = await server.services.rules.versions(1);
    const definition = versions[0]!.definition;
    expect(await call("put", "/api/rules/1", { ...definition, expression: "mlcape >= 1000 and shear_0_6km >= 25 and mlcin > -100", changeNote: "stricter shear" })).toBe(200);
  });

  context = await browser.newContext({ viewport: { width: 1500, height: 1000 }, timezoneId: "America/Chicago", acceptDownloads: true });
  page = await context.newPage();
  page.on("pageerror", (error) => pageErrors.push(error.message));
  await signInThroughPage(page, server.url, "manager", E2E_PASSWORD);
});
afterAll(async () => {
  await context?.close();
  await chromium?.close();
  await server?.close();
});

describe("a manager's post-event review of the demo event", () => {
  beforeEach((ctx) => {
    onTestFailed(async () => {
      await screenshot(page, `history-error-at-${ctx.task.name.slice(0, 40).replace(/\W+/g, "-")}`);
      if (pageErrors.length > 0) console.error("Errors in the page:", pageErrors);
    });
  });

  it("reads the alert history: figures, filters, sorting and one trigger's story", async () => {
    await nav().getByRole("link", { name: "History" }).click();
    await page.getByRole("heading", { name: "Alert history", level: 1 }).waitFor();
    const total = await server.dataSource.getRepository(TriggerEntity).count();
    const figures = page.getByTestId("history-figures");
    await expect.poll(() => figures.textContent()).toContain(`Triggers${total}`);
    // Four acknowledged by the forecaster seconds after opening: a median exists; one escalation-free review.
    expect(await figures.textContent()).toMatch(/Median time to acknowledge\d+ min/);
    const rows = page.locator("table[aria-label='Trigger history'] tbody tr[data-trigger]");
    expect(await rows.count()).toBe(total);

    await page.getByLabel("Rule", { exact: true }).selectOption({ label: "Supercell ingredients" });
    await page.getByRole("button", { name: "Apply filters" }).click();
    await page.waitForURL(/ruleId=1/);
    const supercell = await server.dataSource.getRepository(TriggerEntity).count({ where: { ruleId: 1 } });
    await expect.poll(() => rows.count()).toBe(supercell);
    for (const text of await rows.locator("td:nth-child(4)").allTextContents()) expect(text).toContain("Supercell ingredients");

    await page.getByRole("columnheader", { name: "Zone" }).getByRole("button").click();
    await expect.poll(() => page.getByRole("columnheader", { name: "Zone" }).getAttribute("aria-sort")).toBe("ascending");
    const zones = await rows.locator("td:nth-child(5)").allTextContents();
    expect(zones).toEqual([...zones].sort());

    const acknowledged = rows.filter({ hasText: "forecaster" }).first();
    await acknowledged.getByRole("button", { name: /Show the events and messages/ }).click();
    const story = page.getByRole("list", { name: /Events and messages of trigger/ });
    await story.getByText("Acknowledged").waitFor();
    expect(await story.textContent()).toContain("Watching the dryline");
    await screenshot(page, "history-review");
  });

  it("exports the filtered history as CSV with its header row", async () => {
    const { name, text } = await downloadText(() => page.getByRole("link", { name: "Export CSV" }).click());
    expect(name).toMatch(/^bellwether-trigger-history-.*\.csv$/);
    const [header, ...rows] = splitCsvRecords(text);
    expect(header!.cells).toEqual([...HISTORY_CSV_HEADER]);
    expect(rows.length).toBe(await server.dataSource.getRepository(TriggerEntity).count({ where: { ruleId: 1 } }));
    expect(rows.every((r) => r.cells[2] === "Supercell ingredients")).toBe(true);
  });

  it("prints the event report without the menu, and saves it as PDF", async () => {
    await page.getByRole("link", { name: "Printable event report" }).click();
    await page.getByRole("heading", { name: "Post-event review", level: 1 }).waitFor();
    await page.getByRole("heading", { name: "Verification against storm reports" }).waitFor();
    await page.getByRole("table", { name: "Verification scores" }).waitFor({ timeout: 30_000 });
    await expect.poll(() => page.locator("article h3").count(), { timeout: 30_000 }).toBeGreaterThan(0);
    await page.emulateMedia({ media: "print" });
    expect(await nav().isVisible()).toBe(false);
    expect(await page.getByRole("button", { name: "Print or save as PDF" }).isVisible()).toBe(false);
    await screenshot(page, "history-event-report-print");
    const pdf = await page.pdf({ format: "A4", path: path.join(SCREENSHOT_DIR, "history-event-report.pdf") });
    expect(pdf.subarray(0, 5).toString("latin1")).toBe("%PDF-");
    await page.emulateMedia({ media: "screen" });
  });

  it("scores the rules against the invented storm reports, with charts and a map", async () => {
    await nav().getByRole("link", { name: "Verification" }).click();
    await page.getByRole("heading", { name: "Rule verification", level: 1 }).waitFor();
    const result = page.getByTestId("verification-result");
    await result.waitFor({ timeout: 30_000 });
    await page.getByText("Invented demo reports").waitFor();
    const scores = page.getByRole("table", { name: "Verification scores" });
    const overall = scores.locator("tr[data-row='overall']");
    // The demo's reports fall inside triggered zones at the run's valid times: some are detected.
    await expect.poll(async () => Number(await overall.locator("td[data-column='Detected reports']").textContent())).toBeGreaterThan(0);
    expect(await overall.locator("td[data-column='POD']").textContent()).toMatch(/^0\.\d\d$|^1\.00$/);
    expect(await page.getByRole("img", { name: /^Performance of the selection/ }).count()).toBe(1);
    expect(await page.getByRole("img", { name: /^Lead time of detected reports/ }).count()).toBe(1);
    const map = page.getByRole("img", { name: /^Scored zones and storm reports/ });
    // Every invented report inside the office's zones is on the map (the one east of every zone is not scored).
    const inZones = (await server.dataSource.getRepository(StormReportEntity).count({ where: { invented: true } })) - 1;
    expect(await map.locator("[data-report]").count()).toBe(inZones);
    expect(await map.locator("[data-outcome='missed']").count()).toBeGreaterThan(0);
    const reports = page.getByRole("table", { name: "Scored storm reports" });
    expect(await reports.getByText("Detected").count()).toBeGreaterThan(0);
    await screenshot(page, "verification-demo");
  });

  it("compares two versions of a rule over the same stored frames and reports", async () => {
    await page.getByLabel("Rule", { exact: true }).selectOption({ label: "Supercell ingredients" });
    await page.getByRole("button", { name: "Score" }).click();
    await page.waitForURL(/ruleId=1/);
    const panel = page.locator("section", { has: page.getByRole("heading", { name: /Compare two versions/ }) });
    await panel.getByRole("button", { name: "Compare" }).click();
    const comparison = page.getByTestId("comparison-result");
    await comparison.waitFor({ timeout: 60_000 });
    const versions = comparison.getByRole("table", { name: "Versions compared" });
    expect(await versions.locator("tr[data-version]").count()).toBe(2);
    expect(await comparison.textContent()).toContain("nobody was notified");
    expect(await versions.textContent()).toContain("shear_0_6km >= 25");
    await screenshot(page, "verification-compare");
  });

  it("loads a CSV of storm reports, storing the good rows and listing the refused one", async () => {
    const soon = new Date(Date.now() + 2 * 3_600_000).toISOString().slice(0, 16);
    const csv = [STORM_REPORT_CSV_HEADER, `${soon}Z,36.30,-96.10,hail,1.5,in,Spotter report`, `${soon}Z,36.30,-96.10,hail,3,kt,wrong unit`].join("\n");
    await page.getByTestId("storm-report-file").setInputFiles({ name: "spotters.csv", mimeType: "text/csv", buffer: Buffer.from(csv) });
    const outcome = page.getByTestId("upload-result");
    await outcome.getByText("spotters.csv: 1 report stored").waitFor();
    expect(await page.getByRole("table", { name: "Refused rows" }).textContent()).toContain('magnitude_unit "kt" does not suit hail');
  });

  it("reads the audit trail's chain status and exports it", async () => {
    await nav().getByRole("link", { name: "Audit trail" }).click();
    await page.getByText(/Chain intact/).waitFor();
    const { text } = await downloadText(() => page.getByRole("link", { name: "Export CSV" }).click());
    const [header, ...rows] = splitCsvRecords(text);
    expect(header!.cells).toEqual([...AUDIT_CSV_HEADER]);
    expect(rows.some((r) => r.cells[4] === "storm_reports.uploaded")).toBe(true);
  });

  it("keeps the history from a forecaster", async () => {
    const other = await browser.newContext();
    const forecasterPage = await other.newPage();
    try {
      await signInThroughPage(forecasterPage, server.url, "forecaster", E2E_PASSWORD);
      await forecasterPage.getByRole("navigation", { name: "Main" }).waitFor();
      expect(await forecasterPage.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "History" }).count()).toBe(0);
      const reply = await forecasterPage.request.get(`${server.url}/api/history/triggers.csv`);
      expect(reply.status()).toBe(403);
    } finally {
      await other.close();
    }
  });
});
