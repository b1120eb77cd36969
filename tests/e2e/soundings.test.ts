import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { APIRequestContext, Browser, BrowserContext, Page } from "playwright-core";
import { demoGribFile } from "../../server/demo/demo-run.ts";
import { soundingLinkForPoint } from "../../src/config/paths.ts";
import { launchBrowser, screenshot, SCREENSHOT_DIR } from "./helpers/browser.ts";
import { startE2eServer, E2E_PASSWORD } from "./helpers/server.ts";
import { signInThroughPage } from "./helpers/sign-in.ts";

const FIXTURE = path.resolve("tests/fixtures/soundings/demo-warm-sector.csv");
const KNOTS_PER_MPS = 3600 / 1852; // Source: BIPM SI Brochure, 9th ed. (2019), Table 8 (nautical mile = 1852 m).

let server: Awaited<ReturnType<typeof startE2eServer>>;
let chromium: Awaited<ReturnType<typeof launchBrowser>>;
let browser: Browser;
let scratch: string;

beforeAll(async () => {
  server = await startE2eServer();
  chromium = await launchBrowser();
  browser = chromium.browser;
  scratch = fs.mkdtempSync(path.join(os.tmpdir(), "bellwether-soundings-e2e-"));
});
afterAll(async () => {
  await chromium?.close();
  await server?.close();
  if (scratch) fs.rmSync(scratch, { recursive: true, force: true });
});

/** A signed-in forecaster on a wide screen, on the Soundings page reached through the menu. */
async function openSoundings(): Promise<{ context: BrowserContext; page: Page }> {
  const context = await browser.newContext({ viewport: { width: 1500, height: 1000 } });
  const page = await context.newPage();
  await signInThroughPage(page, server.url, "forecaster", E2E_PASSWORD);
  await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Soundings" }).click();
  await page.waitForURL(/\/soundings/);
  return { context, page };
}

/** The page's own session and CSRF token, for calling the API directly as the same user. */
async function csrfToken(request: APIRequestContext): Promise<string> {
  const reply = await request.get(`${server.url}/api/auth/csrf`);
  return ((await reply.json()) as { token: string }).token;
}

const title = (page: Page) => page.getByTestId("result-title");
const fieldCell = (page: Page, key: string) => page.locator(`td[data-field="${key}"]`);

describe("Soundings page in a real browser", () => {
  it("uploads a sounding file and shows the server's numbers, the skew-T with three parcels, and the hodograph", async () => {
    const { context, page } = await openSoundings();
    try {
      // The first demo appears on arrival; wait for it so the upload below is what replaces it.
      await expect.poll(() => title(page).textContent(), { timeout: 20_000 }).toContain("Demo:");
      await page.getByTestId("sounding-file").setInputFiles(FIXTURE);
      await expect.poll(() => title(page).textContent(), { timeout: 20_000 }).toBe("File: demo-warm-sector.csv");

      const token = await csrfToken(context.request);
      const reply = await context.request.post(`${server.url}/api/soundings/diagnose`, {
        headers: { "x-csrf-token": token },
        multipart: { file: { name: "demo-warm-sector.csv", mimeType: "text/csv", buffer: fs.readFileSync(FIXTURE) } },
      });
      expect(reply.status()).toBe(200);
      const fields = (await reply.json()) as Record<string, number | null>;
      expect(fields.mlcape).toBeGreaterThan(0);

      // Rounded as displayed: whole J/kg, whole m, whole kt, en-US digit grouping.
      const whole = (v: number) => Math.round(v).toLocaleString("en-US");
      expect(await fieldCell(page, "mlcape").textContent()).toBe(whole(fields.mlcape!));
      expect(await fieldCell(page, "sbcape").textContent()).toBe(whole(fields.sbcape!));
      expect(await fieldCell(page, "mucape").textContent()).toBe(whole(fields.mucape!));
      expect(await fieldCell(page, "mllcl_hgt").textContent()).toBe(whole(fields.mllcl_hgt!));
      expect(await fieldCell(page, "shear_0_6km").textContent()).toBe(whole(fields.shear_0_6km! * KNOTS_PER_MPS));
      expect(await fieldCell(page, "scp_fixed").textContent()).toBe("—");
      const mlcapeRow = page.getByRole("row").filter({ has: page.getByRole("rowheader", { name: "mlcape", exact: true }) });
      expect(await mlcapeRow.getAttribute("title")).toContain("lowest 100 hPa");

      const skewT = page.getByRole("img", { name: /^Skew-T diagram/ });
      expect(await skewT.getAttribute("aria-label")).toContain(`MLCAPE ${whole(fields.mlcape!)} J/kg`);
      for (const id of ["sb", "ml", "mu"]) {
        const d = await skewT.locator(`path[data-parcel="${id}"]`).getAttribute("d");
        expect(d?.split("L").length).toBeGreaterThan(10);
      }
      expect(await skewT.locator('path[data-area="positive"]').count()).toBeGreaterThan(0);
      expect(await skewT.locator("[data-marker]").count()).toBeGreaterThanOrEqual(2);

      const hodograph = page.getByRole("img", { name: /^Hodograph/ });
      for (const band of ["0-1", "1-3", "3-6", "6-12"]) expect(await hodograph.locator(`path[data-band="${band}"]`).count()).toBe(1);
      expect(await hodograph.getByTestId("storm-rm").count()).toBe(1);
      expect(await hodograph.getByTestId("storm-lm").count()).toBe(1);

      await screenshot(page, "soundings-uploaded-dark");
      await hodograph.screenshot({ path: path.join(SCREENSHOT_DIR, "soundings-hodograph-dark.png") });

      // Hovering the diagram reads the profile under the pointer.
      await skewT.scrollIntoViewIfNeeded();
      const box = (await skewT.boundingBox())!;
      await page.mouse.move(box.x + box.width * 0.45, box.y + box.height * 0.6);
      await expect.poll(() => page.getByTestId("skew-t-readout").textContent()).toMatch(/hPa · [\d,]+ m AGL.*T -?[\d.]+ °C · Td/);
      await skewT.screenshot({ path: path.join(SCREENSHOT_DIR, "soundings-skew-t-dark.png") });

      // "p" cycles the shaded parcel (ML is first, MU next).
      await page.mouse.move(0, 0);
      await page.keyboard.press("p");
      await expect.poll(() => skewT.getAttribute("aria-label")).toContain("most-unstable parcel");
      await page.getByRole("button", { name: "Switch to the light theme" }).click();
      await screenshot(page, "soundings-uploaded-light");
    } finally {
      await context.close();
    }
  });

  it("shows the line-numbered error beside the input for a malformed file, and takes a dropped file", async () => {
    const bad = path.join(scratch, "dewpoint-above-temperature.csv");
    const lines = fs.readFileSync(FIXTURE, "utf8").split("\n");
    lines[3] = "950,565,25.0,27.0,180,33"; // file line 4: dewpoint above temperature
    fs.writeFileSync(bad, lines.join("\n"));

    const { context, page } = await openSoundings();
    try {
      await expect.poll(() => title(page).textContent(), { timeout: 20_000 }).toContain("Demo:");
      await page.getByTestId("sounding-file").setInputFiles(bad);
      const error = page.getByTestId("sounding-error");
      await error.waitFor({ timeout: 20_000 });
      expect(await error.textContent()).toMatch(/^line 4: /);
      const alert = page.getByRole("alert").filter({ hasText: "Could not read dewpoint-above-temperature.csv" });
      expect(await alert.count()).toBe(1);

      await page.getByRole("button", { name: "Select line 4 in the text" }).click();
      const selected = await page.getByLabel("Or paste CSV text").evaluate((el) => {
        const box = el as HTMLTextAreaElement;
        return box.value.slice(box.selectionStart, box.selectionEnd);
      });
      expect(selected).toBe("950,565,25.0,27.0,180,33");
      await screenshot(page, "soundings-malformed-file");

      // Dropping a good file on the drop zone replaces the error with its result.
      const dataTransfer = await page.evaluateHandle((text) => {
        const transfer = new DataTransfer();
        transfer.items.add(new File([text], "dropped.csv", { type: "text/csv" }));
        return transfer;
      }, fs.readFileSync(FIXTURE, "utf8"));
      await page.getByText("Drop a sounding file here").dispatchEvent("drop", { dataTransfer });
      await expect.poll(() => title(page).textContent(), { timeout: 20_000 }).toBe("File: dropped.csv");
      expect(await page.getByTestId("sounding-error").count()).toBe(0);
    } finally {
      await context.close();
    }
  });

  it("opens the model column under a map point with its model, times and grid point", async () => {
    const { context, page } = await openSoundings();
    try {
      // An invented demo model file, small enough to ingest in a few seconds.
      const runTime = new Date("2026-05-14T12:00:00Z");
      const bytes = demoGribFile({ runTime, forecastHours: [6], nx: 24, ny: 20 }, 6);
      const token = await csrfToken(context.request);
      const upload = await context.request.post(`${server.url}/api/grids`, {
        headers: { "x-csrf-token": token },
        multipart: { file: { name: "demo-small.grib2", mimeType: "application/octet-stream", buffer: Buffer.from(bytes) } },
      });
      expect(upload.status()).toBe(202);
      const jobId = ((await upload.json()) as { job: { id: number } }).job.id;
      await expect
        .poll(async () => ((await (await context.request.get(`${server.url}/api/grids/jobs/${jobId}`)).json()) as { job: { state: string } }).job.state, {
          timeout: 90_000,
          interval: 500,
        })
        .toBe("ready");
      const runs = (await (await context.request.get(`${server.url}/api/grids/runs`)).json()) as { runs: Array<{ frames: Array<{ id: number }> }> };
      const frameId = runs.runs[0].frames[0].id;

      await page.goto(`${server.url}${soundingLinkForPoint(frameId, 36, -98)}`);
      const header = page.getByTestId("column-header");
      await header.waitFor({ timeout: 20_000 });
      const text = (await header.textContent()) ?? "";
      expect(text).toContain("Bellwether demo model (invented)");
      expect(text).toContain("2026-05-14 12:00Z");
      expect(text).toContain("2026-05-14 18:00Z");
      expect(text).toMatch(/i \d+, j \d+ · 3\d\.\d{4}° N, 9\d\.\d{4}° W/);
      await page.getByRole("img", { name: /^Skew-T diagram/ }).waitFor();
      await screenshot(page, "soundings-model-column");

      await page.goto(`${server.url}/soundings?frame=${frameId}&lat=abc`);
      await page.getByRole("alert").filter({ hasText: "This sounding link is not complete" }).waitFor();
    } finally {
      await context.close();
    }
  });
});
