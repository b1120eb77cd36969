import { afterAll, beforeAll, describe, expect, it } from "vitest";
import fs from "node:fs";
import { spawnSync } from "node:child_process";
import { startTestServer, signIn, type SignedInAgent, type TestServer } from "../helpers/test-server.ts";

const FIXTURE = "tests/fixtures/soundings/demo-warm-sector.csv";
const csv = fs.readFileSync(FIXTURE, "utf8");

let server: TestServer;
let forecaster: SignedInAgent;
beforeAll(async () => {
  server = await startTestServer();
  forecaster = await signIn(server.app, "forecaster");
});
afterAll(async () => server.close());

const post = (path: string) => forecaster.agent.post(path).set("x-csrf-token", forecaster.csrf);

describe("POST /api/soundings/diagnose", () => {
  it("returns exactly what the CLI prints with --json", async () => {
    const api = await post("/api/soundings/diagnose").set("content-type", "text/csv").send(csv);
    expect(api.status).toBe(200);
    const cli = spawnSync(process.execPath, ["--import", "tsx", "server/cli/main.ts", "diagnose", FIXTURE, "--json"], { encoding: "utf8" });
    expect(cli.status).toBe(0);
    expect(api.body).toEqual(JSON.parse(cli.stdout));
    expect(api.body.mlcape).toBeGreaterThan(0);
  });

  it("accepts the same sounding as a file upload and as JSON", async () => {
    const asText = (await post("/api/soundings/diagnose").set("content-type", "text/csv").send(csv)).body;
    const asFile = await post("/api/soundings/diagnose").attach("file", Buffer.from(csv), "sounding.csv");
    const asJson = await post("/api/soundings/diagnose").send({ csv });
    expect(asFile.body).toEqual(asText);
    expect(asJson.body).toEqual(asText);
  });

  it("refuses a malformed sounding with 422 naming the line and the problem", async () => {
    const broken = csv.replace(/\n(\d+),/, "\n$1x,");
    const res = await post("/api/soundings/diagnose").set("content-type", "text/csv").send(broken);
    expect(res.status).toBe(422);
    expect(res.body.error.code).toBe("SOUNDING_INVALID");
    expect(res.body.error.message).toMatch(/^line 2: /);
    expect(res.body.error.details.line).toBe(2);
  });

  it("says how to send a sounding when the body is empty", async () => {
    const res = await post("/api/soundings/diagnose").send({});
    expect(res.status).toBe(400);
    expect(res.body.error.message).toContain("text/csv");
  });
});

describe("POST /api/soundings/report", () => {
  it("returns levels, the three parcel paths and the storm motions for the diagram", async () => {
    const res = await post("/api/soundings/report").set("content-type", "text/csv").send(csv);
    expect(res.status).toBe(200);
    expect(res.body.levels.length).toBeGreaterThan(10);
    for (const parcel of ["sb", "ml", "mu"]) expect(res.body.parcels[parcel].pressure.length).toBeGreaterThan(5);
    expect(res.body.stormMotion.rm).toHaveLength(2);
  });
});
