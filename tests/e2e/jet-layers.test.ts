import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { afterAll, beforeAll, beforeEach, describe, expect, it, onTestFailed } from "vitest";
import type { Browser, BrowserContext, Locator, Page } from "playwright-core";
import { demoFileName, demoGribFile } from "../../server/demo/demo-run.ts";
import { launchBrowser, SCREENSHOT_DIR, screenshot } from "./helpers/browser.ts";
import { startE2eServer, E2E_PASSWORD, submitFromInbox } from "./helpers/server.ts";
import { signInThroughPage } from "./helpers/sign-in.ts";

/**
 * The jet-level layers of the map viewer in a real browser: one forecast hour of the invented demo
 * run (the full 100 × 84 domain, so its jet streak lies inside the grid) is ingested, the "Jet level"
 * group is switched on, and the test checks the legend's words, that the axis, core, isotachs,
 * quadrants and arrows are really drawn on their canvases, and takes screenshots in both themes.
 * A second, earlier hour with a curved streak is reached with the frame stepper, layers still on.
 */

const RUN = { runTime: new Date("2026-05-14T12:00:00Z"), forecastHours: [1, 2, 3, 4, 5, 6, 7, 8, 9] };
/** Hour 7: the demo streak's core has moved well inside the domain. */
const HOUR = 7;
/** Hour 1: the streak enters from the west edge with a strongly bent axis, so curvature changes the divergence reading. */
const CURVED_HOUR = 1;

let server: Awaited<ReturnType<typeof startE2eServer>>;
let chromium: Awaited<ReturnType<typeof launchBrowser>>;
let browser: Browser;
let context: BrowserContext;
let page: Page;
let demoDir: string;
const pageErrors: string[] = [];

beforeAll(async () => {
  server = await startE2eServer({ DEMO_GRIDS: "false" });
  demoDir = fs.mkdtempSync(path.join(os.tmpdir(), "bellwether-e2e-jet-"));
  for (const hour of [CURVED_HOUR, HOUR]) {
    const file = path.join(demoDir, demoFileName(RUN.runTime, hour));
    fs.writeFileSync(file, demoGribFile(RUN, hour));
    await submitFromInbox(server, file);
  }
  chromium = await launchBrowser();
  browser = chromium.browser;
  context = await browser.newContext({ viewport: { width: 1440, height: 1000 }, timezoneId: "America/Chicago" });
  page = await context.newPage();
  page.on("pageerror", (error) => pageErrors.push(error.message));
});
afterAll(async () => {
  await context?.close();
  await chromium?.close();
  await server?.close();
  if (demoDir) fs.rmSync(demoDir, { recursive: true, force: true });
});

/** Pixels of a layer's canvas that something was drawn on, and the colour at one grid point. */
async function canvasFacts(layer: Locator, at?: { i: number; j: number; nx: number; ny: number }) {
  return layer.evaluate((element, point) => {
    const canvas = element as HTMLCanvasElement;
    const context = canvas.getContext("2d")!;
    const { data } = context.getImageData(0, 0, canvas.width, canvas.height);
    let drawn = 0;
    for (let k = 3; k < data.length; k += 4) if (data[k]! > 0) drawn++;
    let colour: number[] | null = null;
    if (point) {
      // Grid point (i, j) is centred at ((i + 0.5)·w, (ny − 0.5 − j)·h) in the canvas, j growing northward.
      const x = Math.round(((point.i + 0.5) / point.nx) * canvas.width);
      const y = Math.round(((point.ny - 0.5 - point.j) / point.ny) * canvas.height);
      colour = Array.from(context.getImageData(x, y, 1, 1).data);
    }
    return { drawn, share: drawn / (canvas.width * canvas.height), colour };
  }, at);
}

describe("jet-level layers on the map", () => {
  beforeEach((testContext) => {
    onTestFailed(async () => {
      await screenshot(page, `jet-layers-error-at-${testContext.task.name.slice(0, 40).replace(/\W+/g, "-")}`);
      if (pageErrors.length > 0) console.error("Errors in the page:", pageErrors);
    });
  });

  it("opens the ingested frame with the jet layers off and offered under one switch", async () => {
    await signInThroughPage(page, server.url, "forecaster", E2E_PASSWORD);
    await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Grids" }).click();
    const open = page.getByRole("link", { name: /Open F07 of the 2026-05-14 12Z/ });
    await open.waitFor({ timeout: 120_000 });
    await open.click();
    await page.waitForURL(/\/grids\/frames\/\d+/);
    await page.getByLabel("Field").selectOption("jet_speed");
    await page.waitForURL(/field=jet_speed/);

    const layers = page.locator("section", { has: page.getByRole("heading", { name: "Layers", exact: true }) });
    for (const name of ["Quadrants and divergence", "Isotachs (kt)", "Ageostrophic wind", "Streak axes and cores"]) {
      const toggle = layers.getByLabel(name);
      expect(await toggle.isChecked(), name).toBe(false);
      expect(await toggle.isEnabled(), name).toBe(true);
    }
    expect(await page.getByRole("region", { name: "Jet level legend" }).count()).toBe(0);
  });

  it("switches the whole group on and explains it in words", async () => {
    const layers = page.locator("section", { has: page.getByRole("heading", { name: "Layers", exact: true }) });
    // The switch goes through the address, so its state follows a moment after the click.
    const group = layers.getByLabel(/^Jet level/);
    await group.click();
    await page.waitForURL(/show=/);
    await expect.poll(() => group.isChecked()).toBe(true);
    for (const name of ["Quadrants and divergence", "Isotachs (kt)", "Ageostrophic wind", "Streak axes and cores"]) {
      expect(await layers.getByLabel(name).isChecked(), name).toBe(true);
    }
    const show = new URL(page.url()).searchParams.get("show")!.split(",");
    expect(show).toEqual(expect.arrayContaining(["jet-quadrants", "jet-isotachs", "jet-arrows", "jet-axes"]));

    const legend = page.getByRole("region", { name: "Jet level legend" });
    // The demo run is valid in May: the warm-season jet level.
    await expect.poll(() => legend.getByRole("heading", { level: 3 }).textContent()).toContain("250 hPa");
    const quadrants = legend.getByRole("list", { name: "Jet-streak quadrants" });
    for (const words of ["left entrance", "right entrance", "left exit", "right exit", "core"]) {
      expect(await quadrants.getByText(words, { exact: true }).count(), words).toBe(1);
    }
    const readings = legend.getByRole("list", { name: "Divergence readings" });
    expect(await readings.getByText("divergence favoured", { exact: true }).count()).toBe(1);
    expect(await readings.getByText("ambiguous", { exact: true }).count()).toBe(1);

    const streaks = legend.getByRole("list", { name: "Jet streaks" }).getByRole("listitem");
    await expect.poll(() => streaks.count()).toBe(1);
    expect(await streaks.first().textContent()).toMatch(/^Streak 1: core \d{2,3} kt at \d+\.\d\d° N, \d+\.\d\d° W, (straight|(strongly )?(cyclonic|anticyclonic))/);
    await expect.poll(() => legend.getByTestId("ageostrophic-key").textContent()).toMatch(/^\d+ m\/s \(\d+ kt\)$/);
    expect(await legend.textContent()).toContain("every 10 kt from 60 kt");
  });

  it("draws the axis through the core, the isotachs, the quadrants and the arrows", async () => {
    const frameId = Number(/\/grids\/frames\/(\d+)/.exec(page.url())![1]);
    const doc = await page.evaluate(async (id) => (await fetch(`/api/grids/frames/${id}/jet-streaks`)).json(), frameId);
    const frame = await page.evaluate(async (id) => (await fetch(`/api/grids/frames/${id}`)).json(), frameId);
    const { nx, ny } = frame.frame.geometry as { nx: number; ny: number };
    const core = doc.streaks[0].core as { i: number; j: number };

    const axes = page.locator('canvas[data-layer="jet-axes"]');
    await axes.waitFor({ state: "attached" });
    await expect.poll(async () => (await canvasFacts(axes)).drawn).toBeGreaterThan(500);
    // The core's disc is gold (#ffd23f) where the document puts the core.
    const { colour } = await canvasFacts(axes, { ...core, nx, ny });
    expect(colour![0]).toBeGreaterThan(230);
    expect(colour![1]).toBeGreaterThan(180);
    expect(colour![2]).toBeLessThan(110);
    expect(colour![3]).toBe(255);

    const isotachs = page.locator('canvas[data-layer="jet-isotachs"]');
    await expect.poll(async () => (await canvasFacts(isotachs)).drawn).toBeGreaterThan(500);
    const quadrants = page.locator('canvas[data-layer="jet-quadrants"]');
    // The demo streak's labelled points cover a large part of the domain.
    await expect.poll(async () => (await canvasFacts(quadrants)).share).toBeGreaterThan(0.2);
    const arrows = page.locator('canvas[data-layer="jet-ageostrophic-arrows"]');
    await expect.poll(async () => (await canvasFacts(arrows)).drawn).toBeGreaterThan(2000);
    expect(pageErrors).toEqual([]);
  });

  it("reads clearly in both themes", async () => {
    fs.mkdirSync(SCREENSHOT_DIR, { recursive: true });
    const stage = page.locator('canvas[data-layer="jet-axes"]').locator("xpath=..");
    await screenshot(page, "jet-layers-dark");
    await stage.screenshot({ path: path.join(SCREENSHOT_DIR, "jet-layers-map-dark.png") });
    await page.getByRole("region", { name: "Jet level legend" }).screenshot({ path: path.join(SCREENSHOT_DIR, "jet-layers-legend-dark.png") });

    await page.getByRole("button", { name: "Switch to the light theme" }).click();
    await expect.poll(() => page.evaluate(() => document.documentElement.dataset.theme)).toBe("light");
    await screenshot(page, "jet-layers-light");
    await page.getByRole("region", { name: "Jet level legend" }).screenshot({ path: path.join(SCREENSHOT_DIR, "jet-layers-legend-light.png") });

    // Divergence as the field beneath: the quadrants' divergence pattern shows through the shading.
    await page.getByLabel("Field").selectOption("jet_div");
    await page.waitForURL(/field=jet_div/);
    await screenshot(page, "jet-layers-divergence-light");
    await page.getByRole("button", { name: "Switch to the dark theme" }).click();
    expect(pageErrors).toEqual([]);
  });

  it("keeps the layers on when stepping to an hour with a curved streak, and names its curvature", async () => {
    await page.getByLabel("Field").selectOption("jet_speed");
    await page.waitForURL(/field=jet_speed/);
    // The address changes before the page has drawn the new field; step once the legend names it.
    await expect.poll(() => page.getByRole("region", { name: "Legend", exact: true }).textContent()).toContain("jet_speed");
    await page.keyboard.press("[");
    await page.getByRole("heading", { name: /F01/, level: 1 }).waitFor();
    expect(page.url()).toContain("jet-axes");
    expect(page.url()).toContain("field=jet_speed");
    const streak = page.getByRole("region", { name: "Jet level legend" }).getByRole("list", { name: "Jet streaks" }).getByRole("listitem").first();
    await expect.poll(() => streak.textContent()).toMatch(/anticyclonic/);
    const labels = page.locator('canvas[data-layer="jet-quadrant-labels"]');
    await expect.poll(async () => (await canvasFacts(labels)).drawn).toBeGreaterThan(100);
    await page.locator('canvas[data-layer="jet-axes"]').locator("xpath=..").screenshot({ path: path.join(SCREENSHOT_DIR, "jet-layers-curved-map-dark.png") });
    expect(pageErrors).toEqual([]);
  });
});
