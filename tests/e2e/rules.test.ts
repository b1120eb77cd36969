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
 * The Rules and Zones screens in a real browser, over the invented demo office (its zones and starter
 * rules) and one forecast hour of the invented demo run: a lead writes a rule in the editor, sees a
 * live error for a misspelt field, fixes it through the suggestions, sees the preview map, saves,
 * edits it again (version 2) and reads the difference in the history; runs a backtest; a forecaster
 * sees the same rule read-only. Then the Zones page: a refused import lists every problem, a zone
 * outside the grid is flagged, and a zone drawn on the map is saved.
 */

const RULE_NAME = "Deep shear over buoyancy (browser test)";

let server: Awaited<ReturnType<typeof startE2eServer>>;
let chromium: Awaited<ReturnType<typeof launchBrowser>>;
let browser: Browser;
let leadContext: BrowserContext;
let lead: Page;
let demoDir: string;
let ruleUrl = "";
const pageErrors: string[] = [];

/** Resolves once the ingest of `file` has stored its frame (frames are stored only once fully diagnosed). */
async function ingestAndWait(file: string): Promise<void> {
  await submitFromInbox(server, file);
  const deadline = Date.now() + 180_000;
  while ((await server.services.grids.listRuns(5)).flatMap((run) => run.frames).length === 0) {
    if (Date.now() > deadline) throw new Error(`${path.basename(file)} was not ingested within 3 minutes`);
    await new Promise((resolve) => setTimeout(resolve, 500));
  }
}

beforeAll(async () => {
  server = await startE2eServer({ DEMO_GRIDS: "false" });
  demoDir = fs.mkdtempSync(path.join(os.tmpdir(), "bellwether-e2e-rules-"));
  // The demo atmosphere develops through the run; its sixth hour has the afternoon's buoyancy.
  const files = writeDemoRun(demoDir, { runTime: new Date("2026-05-14T12:00:00Z"), forecastHours: [1, 2, 3, 4, 5, 6] });
  await ingestAndWait(files[5]!);
  chromium = await launchBrowser();
  browser = chromium.browser;
  leadContext = await browser.newContext({ viewport: { width: 1440, height: 1000 }, timezoneId: "America/Chicago" });
  lead = await leadContext.newPage();
  lead.on("pageerror", (error) => pageErrors.push(error.message));
});

afterAll(async () => {
  await leadContext?.close();
  await chromium?.close();
  await server?.close();
  if (demoDir) fs.rmSync(demoDir, { recursive: true, force: true });
});

const panel = (page: Page, title: string) => page.locator("section", { has: page.getByRole("heading", { name: title, exact: true }) });

describe("rules and zones in a real browser", () => {
  beforeEach((context) => {
    onTestFailed(async () => {
      await screenshot(lead, `rules-failed-${context.task.name.slice(0, 40).replace(/\W+/g, "-")}`);
      if (pageErrors.length > 0) console.error("Errors in the page:", pageErrors);
    });
  });

  it("lists the demo office's rules for a lead", async () => {
    await signInThroughPage(lead, server.url, "lead", E2E_PASSWORD);
    await lead.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Rules" }).click();
    await lead.getByRole("heading", { name: "Rules", level: 1 }).waitFor();
    await lead.getByRole("link", { name: "Supercell ingredients", exact: true }).waitFor();
    expect(await lead.getByRole("switch").count()).toBeGreaterThan(0);
    await screenshot(lead, "rules-list");
  });

  it("writes a rule: a live error for a misspelt field, a suggestion to fix it, the preview", async () => {
    await lead.getByRole("link", { name: "New rule" }).click();
    await lead.getByRole("heading", { name: "New rule", level: 1 }).waitFor();
    await lead.getByLabel("Name", { exact: true }).fill(RULE_NAME);

    const expression = lead.getByRole("combobox", { name: "Expression" });
    await expression.fill("mlcap >= 1000 and shear_0_6km >= 20");
    await lead.getByText('Unknown field "mlcap"').waitFor();
    // The misspelt word is underlined where it stands.
    expect(await lead.locator("mark").first().textContent()).toBe("mlcap");
    expect(await expression.getAttribute("aria-invalid")).toBe("true");
    // Unit hints: the shear threshold in knots.
    await lead.getByText("shear_0_6km >= 20 m/s ≈ 39 kt").waitFor();
    await screenshot(lead, "rule-editor-error");

    // Fix it through the suggestions: retype the word's start and take "mlcape".
    await expression.fill("");
    await expression.pressSequentially("mlc");
    const suggestions = lead.getByRole("listbox", { name: "Suggestions" });
    await suggestions.getByRole("option", { name: /^mlcape/ }).waitFor();
    await screenshot(lead, "rule-editor-suggestions");
    await expression.press("Enter");
    await expression.pressSequentially(" >= 1000 and shear_0_6km >= 20");
    expect(await expression.inputValue()).toBe("mlcape >= 1000 and shear_0_6km >= 20");
    await expect.poll(() => lead.getByText(/Unknown field/).count()).toBe(0);
    expect(await expression.getAttribute("aria-invalid")).toBeNull();

    await lead.getByRole("button", { name: "All" }).click();
    await lead.getByLabel("Spatial condition").selectOption("min-coverage");
    const preview = panel(lead, "Preview on the newest frame");
    await preview.getByTestId("preview-summary").waitFor({ timeout: 30_000 });
    expect(await preview.getByTestId("preview-summary").textContent()).toMatch(/Matches [\d,]+ grid points? of [\d,]+/);
    expect(await preview.getByRole("table", { name: "Matches per zone" }).getByRole("row").count()).toBe(9); // a header and the eight demo zones
    await lead.waitForTimeout(300);
    await screenshot(lead, "rule-editor-preview");

    await lead.getByRole("button", { name: "Save rule" }).click();
    await lead.waitForURL(/\/rules\/\d+$/);
    ruleUrl = lead.url();
    await lead.getByRole("heading", { name: RULE_NAME, level: 1 }).waitFor();
    await lead.getByText(/Version 1, saved/).waitFor();
  });

  it("edits the rule into version 2 and shows the difference in the history", async () => {
    const expression = lead.getByRole("combobox", { name: "Expression" });
    await expression.fill("mlcape >= 1500 and shear_0_6km >= 20");
    await lead.getByRole("radio", { name: "Urgent" }).check();
    // Recipients come from the office's contact lists (the demo office has a partner group).
    const groups = lead.getByRole("group", { name: "Contact groups" });
    await groups.getByRole("checkbox").first().check();
    await lead.getByLabel("Change note").fill("Raise the buoyancy threshold");
    await lead.getByRole("button", { name: "Save as version 2" }).click();
    await lead.getByText(/Version 2, saved/).waitFor();

    await lead.getByRole("link", { name: "History" }).click();
    await lead.getByRole("heading", { name: `History of ${RULE_NAME}`, level: 1 }).waitFor();
    await lead.getByRole("cell", { name: "Raise the buoyancy threshold" }).waitFor();
    const changes = panel(lead, "Changes from version 1 to version 2");
    await changes.waitFor();
    expect(await changes.locator("del", { hasText: "1000" }).count()).toBe(1);
    expect(await changes.locator("ins", { hasText: "1500" }).count()).toBe(1);
    expect(await changes.getByText("Heads-up").count()).toBe(1);
    expect(await changes.getByText("Urgent").count()).toBe(1);
    expect(await changes.getByText("Recipients").count()).toBe(1);
    await screenshot(lead, "rule-history");
  });

  it("backtests a version over the stored frames", async () => {
    await lead.goto(`${ruleUrl}/backtest`);
    await lead.getByRole("heading", { name: `Backtest of ${RULE_NAME}`, level: 1 }).waitFor();
    await lead.getByRole("button", { name: "Run backtest" }).click();
    await lead.getByRole("heading", { name: /Version 2: would have opened \d+ triggers?/ }).waitFor({ timeout: 30_000 });
    expect(await lead.getByRole("region", { name: "Frames" }).getByRole("article").count()).toBe(1);
    await lead.waitForTimeout(300);
    await screenshot(lead, "rule-backtest");
  });

  it("shows the rule read-only to a forecaster", async () => {
    const context = await browser.newContext({ viewport: { width: 1440, height: 1000 }, timezoneId: "America/Chicago" });
    const page = await context.newPage();
    try {
      await signInThroughPage(page, server.url, "forecaster", E2E_PASSWORD);
      await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Rules" }).click();
      await page.getByRole("link", { name: RULE_NAME, exact: true }).click();
      await page.getByRole("heading", { name: RULE_NAME, level: 1 }).waitFor();
      await page.getByText("Read-only: only leads edit rules.").waitFor();
      const expression = page.getByRole("combobox", { name: "Expression" });
      expect(await expression.inputValue()).toBe("mlcape >= 1500 and shear_0_6km >= 20");
      expect(await expression.getAttribute("readonly")).not.toBeNull();
      expect(await page.getByLabel("Name", { exact: true }).isDisabled()).toBe(true);
      expect(await page.getByRole("button", { name: /Save/ }).count()).toBe(0);
      expect(await page.getByRole("heading", { name: "Preview on the newest frame" }).count()).toBe(0);
      expect(await page.getByRole("link", { name: "Backtest" }).count()).toBe(0);
      expect(await page.getByRole("button", { name: "Archive" }).count()).toBe(0);
      expect(await page.getByRole("switch", { name: /is (on|off)/ }).count()).toBe(0);
      await screenshot(page, "rule-read-only-forecaster");
    } finally {
      await context.close();
    }
  });

  it("lists zones, and a refused import names every problem", async () => {
    await lead.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Zones" }).click();
    await lead.getByRole("heading", { name: "Zones", level: 1 }).waitFor();
    await lead.getByRole("cell", { name: "CWB", exact: true }).waitFor();
    const bad = path.join(demoDir, "bad-zones.geojson");
    const square = [[-100, 35], [-99, 35], [-99, 36], [-100, 36], [-100, 35]];
    const bowTie = [[-98, 35], [-97, 36], [-97, 35], [-98, 36], [-98, 35]];
    const unclosed = [[-96, 35], [-95, 35], [-95, 36], [-96, 36]];
    fs.writeFileSync(
      bad,
      JSON.stringify({
        type: "FeatureCollection",
        features: [
          { type: "Feature", properties: { code: "OK1", name: "Fine square" }, geometry: { type: "Polygon", coordinates: [square] } },
          { type: "Feature", properties: { code: "BOW", name: "Bow tie" }, geometry: { type: "Polygon", coordinates: [bowTie] } },
          { type: "Feature", properties: { code: "OPN", name: "Open ring" }, geometry: { type: "Polygon", coordinates: [unclosed] } },
        ],
      }),
    );
    await lead.getByLabel("Import GeoJSON…").setInputFiles(bad);
    const problems = lead.getByRole("list", { name: "Problems in the file" });
    await problems.waitFor();
    expect(await problems.getByRole("listitem").count()).toBe(2);
    expect(await problems.textContent()).toContain("BOW: outer ring: the ring crosses itself");
    expect(await problems.textContent()).toContain("OPN: outer ring: the ring is not closed");
    expect(await lead.getByRole("cell", { name: "OK1", exact: true }).count()).toBe(0);
    await screenshot(lead, "zones-import-refused");

    // A valid zone far from the model grid is taken, and flagged for covering no grid point.
    const far = path.join(demoDir, "far-zone.geojson");
    const farRing = [[10, 50], [11, 50], [11, 51], [10, 51], [10, 50]];
    fs.writeFileSync(far, JSON.stringify({ type: "FeatureCollection", features: [{ type: "Feature", properties: { code: "FAR", name: "Far from the grid" }, geometry: { type: "Polygon", coordinates: [farRing] } }] }));
    await lead.getByLabel("Import GeoJSON…").setInputFiles(far);
    await lead.getByRole("row", { name: /FAR/ }).getByText("Covers no grid point").waitFor();
    await lead.getByText("Some zones cover no grid point").waitFor();
  });

  it("draws a zone on the newest grid and saves it", async () => {
    await lead.getByRole("button", { name: "Draw a zone" }).click();
    const map = lead.getByRole("application", { name: /Zone drawing map/ });
    await map.waitFor();
    const box = (await map.boundingBox())!;
    const at = (fx: number, fy: number) => ({ x: box.x + box.width * fx, y: box.y + box.height * fy });
    for (const [fx, fy] of [[0.3, 0.3], [0.5, 0.3], [0.5, 0.6]] as const) {
      const p = at(fx, fy);
      await lead.mouse.click(p.x, p.y);
    }
    // A fourth corner that makes the ring cross itself is shown at once.
    const crossing = at(0.6, 0.45);
    await lead.mouse.click(crossing.x, crossing.y);
    await lead.getByText(/the ring crosses itself/).waitFor();
    await screenshot(lead, "zones-draw-crossing");
    await map.press("Backspace");
    await expect.poll(() => lead.getByText(/the ring crosses itself/).count()).toBe(0);
    const last = at(0.3, 0.6);
    await lead.mouse.dblclick(last.x, last.y);
    await lead.getByText(/Closed with 4 corners/).waitFor();
    await lead.getByLabel("Code").last().fill("NEW");
    await lead.getByLabel("Name").last().fill("Drawn in the browser test");
    await screenshot(lead, "zones-draw-closed");
    await lead.getByRole("button", { name: "Save zone" }).click();
    await lead.getByRole("cell", { name: "NEW", exact: true }).waitFor();
    await screenshot(lead, "zones-list");
  });
});
