import { afterAll, beforeAll, describe, expect, it } from "vitest";
import fs from "node:fs";
import path from "node:path";
import { startTestServer, signIn, ingestBytes, type SignedInAgent, type TestServer } from "../helpers/test-server.ts";
import { fakeGribBytes, syntheticRecords, SYNTHETIC_GEOMETRY } from "../helpers/synthetic-grid.ts";
import { IngestJobEntity } from "../../server/entities/ingest-job.entity.ts";
import { GridFrameEntity } from "../../server/entities/grid-frame.entity.ts";
import { InboxPoller } from "../../jobs/ingest/poll-inbox.job.ts";
import { pruneOldRuns } from "../../jobs/maintenance/prune-grids.job.ts";
import { createLogger } from "../../server/logger.ts";
import type { ModelParameter } from "../../server/ingest/grid-record.ts";

/**
 * The ingest pipeline with a stand-in decoder: the bytes name what the "file" holds
 * (`model|omit|fail`), so each test controls the records without real GRIB2 content.
 */
function decodeByTag(bytes: Uint8Array) {
  const [model, omit, fail] = Buffer.from(bytes).toString("latin1").slice(8).split("|");
  if (fail) throw new Error(`Section 5 of message 1 is truncated (${fail})`);
  return syntheticRecords({ model, omit: (omit || undefined) as ModelParameter | undefined, validTimes: ["2026-05-14T18:00:00.000Z", "2026-05-14T19:00:00.000Z"] });
}

let server: TestServer;
let forecaster: SignedInAgent;
const upload = (bytes: Buffer, name = "grid.grib2") => forecaster.agent.post("/api/grids").set("x-csrf-token", forecaster.csrf).attach("file", bytes, name);

beforeAll(async () => {
  server = await startTestServer({}, { decode: decodeByTag });
  forecaster = await signIn(server.app, "forecaster");
});
afterAll(async () => server.close());

describe("grid upload and ingest", () => {
  it("turns an upload into ready frames with stored fields", async () => {
    const res = await upload(fakeGribBytes("alpha"));
    expect(res.status).toBe(202);
    expect(res.body.job.state).toBe("queued");
    await server.services.ingest.idle();

    const job = (await forecaster.agent.get(`/api/grids/jobs/${res.body.job.id}`)).body.job;
    expect(job).toMatchObject({ state: "ready", progress: 1, frameCount: 2, submittedBy: "forecaster" });
    expect(job.ignoredFields).toEqual(["visibility at surface"]);

    const runs = (await forecaster.agent.get("/api/grids/runs")).body.runs;
    const run = runs.find((r: { model: string }) => r.model === "alpha");
    expect(run.frames.map((f: { forecastHour: number }) => f.forecastHour)).toEqual([6, 7]);

    const frame = (await forecaster.agent.get(`/api/grids/frames/${run.frames[0].id}`)).body.frame;
    const keys = frame.fields.map((f: { key: string }) => f.key);
    expect(keys).toEqual(expect.arrayContaining(["mlcape", "shear_0_6km", "srh_0_1km", "t_2m", "td_2m"]));
    expect(frame.levels[0]).toBeGreaterThan(frame.levels[1]);

    const field = await forecaster.agent.get(`/api/grids/frames/${run.frames[0].id}/fields/shear_0_6km`).buffer(true).parse((r, done) => {
      const chunks: Buffer[] = [];
      r.on("data", (c: Buffer) => chunks.push(c));
      r.on("end", () => done(null, Buffer.concat(chunks)));
    });
    expect(field.headers["x-grid-nx"]).toBe(String(SYNTHETIC_GEOMETRY.nx));
    const values = new Float32Array(new Uint8Array(field.body as Buffer).buffer);
    expect(values).toHaveLength(SYNTHETIC_GEOMETRY.nx * SYNTHETIC_GEOMETRY.ny);
    // The synthetic wind grows 3 m/s per km, so the 0–6 km bulk shear is well above zero everywhere.
    expect(Math.min(...values)).toBeGreaterThan(5);
  });

  it("opens the model column at a point as a sounding", async () => {
    const frame = await server.dataSource.getRepository(GridFrameEntity).findOneByOrFail({ model: "alpha", forecastHour: 6 });
    const res = await forecaster.agent.get(`/api/grids/frames/${frame.id}/column?lat=35.1&lon=-99.2`);
    expect(res.status).toBe(200);
    expect(res.body.point).toMatchObject({ i: 2, j: 2, lat: 35, lon: -99 });
    expect(res.body.report.levels.length).toBeGreaterThan(5);
    expect(res.body.report.fields).toHaveProperty("mlcape");
    const outside = await forecaster.agent.get(`/api/grids/frames/${frame.id}/column?lat=10&lon=-99`);
    expect(outside.status).toBe(400);
    expect(outside.body.error.message).toContain("outside");
  });

  it("recognises the same file twice and does not process it again", async () => {
    const before = await server.dataSource.getRepository(IngestJobEntity).count();
    const again = await upload(fakeGribBytes("alpha"));
    expect(again.status).toBe(200);
    expect(again.body.duplicate).toBe(true);
    expect(await server.dataSource.getRepository(IngestJobEntity).count()).toBe(before);
  });

  it("refuses a file that is not GRIB2 or NetCDF by its bytes, whatever its name", async () => {
    const res = await upload(Buffer.from("just some text, not a grid"), "looks-like.grib2");
    expect(res.status).toBe(415);
    expect(res.body.error).toMatchObject({ code: "UNSUPPORTED_FILE" });
    expect(res.body.error.message).toContain("neither GRIB2 nor NetCDF");
    const grib1 = await upload(Buffer.from("GRIB\0\0\0\x01rest", "latin1"), "old.grb");
    expect(grib1.body.error.message).toContain("edition 1");
  });

  it("answers 400 when no file is attached", async () => {
    const res = await forecaster.agent.post("/api/grids").set("x-csrf-token", forecaster.csrf).field("note", "nothing");
    expect(res.status).toBe(400);
    expect(res.body.error.message).toContain('"file"');
  });

  it("fails a job whose file lacks a required field, listing it, and stores no frame", async () => {
    const frames = await server.dataSource.getRepository(GridFrameEntity).count();
    const { job } = await ingestBytes(server, fakeGribBytes("beta|pressure"), "no-psfc.grib2");
    const stored = await server.dataSource.getRepository(IngestJobEntity).findOneByOrFail({ id: job.id });
    expect(stored.state).toBe("failed");
    expect(stored.failureReason).toContain("surface pressure");
    expect(await server.dataSource.getRepository(GridFrameEntity).count()).toBe(frames);
    expect(fs.readdirSync(path.join(server.dataDir, "grids", ".partial"))).toEqual([]);
  });

  it("fails a job whose decoder refuses the file, keeps other runs and keeps serving", async () => {
    const { job } = await ingestBytes(server, fakeGribBytes("gamma||bad section"), "broken.grib2");
    const stored = await server.dataSource.getRepository(IngestJobEntity).findOneByOrFail({ id: job.id });
    expect(stored.state).toBe("failed");
    expect(stored.failureReason).toContain("truncated");
    expect((await forecaster.agent.get("/api/health")).status).toBe(200);
    const runs = (await forecaster.agent.get("/api/grids/runs")).body.runs;
    expect(runs.some((r: { model: string }) => r.model === "alpha")).toBe(true);
  });

  it("resumes a job that a crash left half done", async () => {
    const repo = server.dataSource.getRepository(IngestJobEntity);
    const { job } = await ingestBytes(server, fakeGribBytes("delta"), "delta.grib2");
    // Simulate a crash mid-way: the row says "diagnosing" and nothing is stored for it.
    await repo.update({ id: job.id }, { state: "diagnosing", progress: 0.4 });
    await server.dataSource.getRepository(GridFrameEntity).delete({ ingestJobId: job.id });
    expect(await server.services.ingest.resumeUnfinished()).toBe(1);
    await server.services.ingest.idle();
    expect((await repo.findOneByOrFail({ id: job.id })).state).toBe("ready");
    expect(await server.dataSource.getRepository(GridFrameEntity).countBy({ ingestJobId: job.id })).toBe(2);
  });

  it("replaces a frame when a newer file for the same run and valid time arrives", async () => {
    const frames = server.dataSource.getRepository(GridFrameEntity);
    await ingestBytes(server, fakeGribBytes("epsilon"), "first.grib2");
    const first = await frames.findOneByOrFail({ model: "epsilon", forecastHour: 6 });
    await ingestBytes(server, fakeGribBytes("epsilon|"), "corrected.grib2");
    const all = await frames.findBy({ model: "epsilon", forecastHour: 6 });
    expect(all).toHaveLength(1);
    expect(all[0]!.id).not.toBe(first.id);
    expect(fs.existsSync(path.join(server.dataDir, first.folder))).toBe(false);
  });
});

describe("inbox folder", () => {
  it("takes a file once its size is stable, ignores partial names, and records the source", async () => {
    const inbox = path.join(server.dataDir, "inbox-test");
    const poller = new InboxPoller(inbox, path.join(server.dataDir, "incoming"), server.services.ingest, createLogger("silent"));
    fs.writeFileSync(path.join(inbox, "zeta.grib2"), fakeGribBytes("zeta"));
    fs.writeFileSync(path.join(inbox, "eta.grib2.part"), fakeGribBytes("eta"));
    expect(await poller.poll()).toBe(0); // first sighting: size not yet known to be stable
    expect(await poller.poll()).toBe(1);
    await server.services.ingest.idle();
    expect(fs.readdirSync(inbox)).toEqual(["eta.grib2.part"]);
    const job = await server.dataSource.getRepository(IngestJobEntity).findOneByOrFail({ originalName: "zeta.grib2" });
    expect(job).toMatchObject({ source: "inbox", state: "ready" });
  });

  it("records a non-grid file dropped in the inbox as a failed job with the reason", async () => {
    const inbox = path.join(server.dataDir, "inbox-test-2");
    const poller = new InboxPoller(inbox, path.join(server.dataDir, "incoming"), server.services.ingest, createLogger("silent"));
    fs.writeFileSync(path.join(inbox, "notes.txt"), "shift notes");
    await poller.poll();
    await poller.poll();
    const job = await server.dataSource.getRepository(IngestJobEntity).findOneByOrFail({ originalName: "notes.txt" });
    expect(job.state).toBe("failed");
    expect(job.failureReason).toContain("neither GRIB2 nor NetCDF");
  });
});

describe("retention", () => {
  it("deletes runs older than the retention period with their files", async () => {
    const frames = server.dataSource.getRepository(GridFrameEntity);
    const alpha = await frames.findBy({ model: "alpha" });
    expect(alpha.length).toBe(2);
    // The synthetic run time is 2026-05-14T12Z: 30 days later with 14 days of retention, it goes.
    const result = await pruneOldRuns(server.dataSource, server.dataDir, 14, new Date("2026-06-13T12:00:00Z"));
    expect(result.runs).toBeGreaterThan(0);
    expect(await frames.countBy({ model: "alpha" })).toBe(0);
    for (const f of alpha) expect(fs.existsSync(path.join(server.dataDir, f.folder))).toBe(false);
  });
});
