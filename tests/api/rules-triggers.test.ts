import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { startTestServer, signIn, ingestBytes, type SignedInAgent, type TestServer } from "../helpers/test-server.ts";
import { fakeGribBytes, syntheticRecords } from "../helpers/synthetic-grid.ts";
import { TriggerEntity } from "../../server/entities/trigger.entity.ts";
import { RuleEvaluationEntity } from "../../server/entities/rule-evaluation.entity.ts";
import { decodeMaskBits } from "../../shared/grid/mask-bits.ts";
import { testRule } from "../helpers/rule-builder.ts";

/**
 * The alerting engine end to end with made-up grids: the bytes of each "file" name its run, valid
 * times and how sheared its winds are, so each test controls whether the rule is met.
 */
function decodeByTag(bytes: Uint8Array) {
  const [model, run, hours, shear] = Buffer.from(bytes).toString("latin1").slice(8).split("|");
  const runTime = `2026-05-14T${run}:00:00.000Z`;
  const validTimes = hours!.split(",").map((h) => new Date(Date.parse(runTime) + Number(h) * 3_600_000).toISOString());
  return syntheticRecords({ model, runTime, validTimes, shearScale: Number(shear) });
}
const file = (model: string, run: string, hours: string, shear: number) => fakeGribBytes(`${model}|${run}|${hours}|${shear}`);

const SQUARE = { type: "Polygon", coordinates: [[[-100.1, 33.9], [-97.4, 33.9], [-97.4, 36.1], [-100.1, 36.1], [-100.1, 33.9]]] };
let server: TestServer;
let lead: SignedInAgent;
let forecaster: SignedInAgent;
let zoneId: number;
let ruleId: number;

const rule = (over: Record<string, unknown> = {}) => testRule([zoneId], { spatialCondition: { kind: "min-coverage", percent: 50 }, ...over });

async function settle() {
  await server.services.ingest.idle();
  await server.services.evaluation.idle();
}
const triggersOf = (model: string) => server.dataSource.getRepository(TriggerEntity).find({ where: { model }, order: { id: "ASC" } });

beforeAll(async () => {
  server = await startTestServer({}, { decode: decodeByTag });
  lead = await signIn(server.app, "lead");
  forecaster = await signIn(server.app, "forecaster");
  zoneId = (await lead.agent.post("/api/zones").set("x-csrf-token", lead.csrf).send({ code: "TST", name: "Test zone", geometry: SQUARE })).body.zone.id;
  const created = await lead.agent.post("/api/rules").set("x-csrf-token", lead.csrf).send(rule());
  expect(created.status).toBe(201);
  ruleId = created.body.rule.id;
});
afterAll(async () => server.close());

describe("rules", () => {
  it("refuses an expression with a clear message and its position", async () => {
    const res = await lead.agent.post("/api/rules").set("x-csrf-token", lead.csrf).send(rule({ expression: "mlcape >= 1000 and shaer_0_6km >= 20" }));
    expect(res.status).toBe(400);
    const issue = res.body.error.details.issues.find((i: { field: string }) => i.field === "expression");
    expect(issue.message).toContain("shaer_0_6km");
    const check = await forecaster.agent.post("/api/rules/check").set("x-csrf-token", forecaster.csrf).send({ expression: "mlcape >= 1000 and shaer_0_6km >= 20" });
    expect(check.body.ok).toBe(false);
    expect(check.body.errors[0].position).toBe(19);
  });

  it("keeps every saved edit as a new version with who and why", async () => {
    const edited = await lead.agent.put(`/api/rules/${ruleId}`).set("x-csrf-token", lead.csrf).send({ ...rule({ description: "Tuned" }), changeNote: "wording" });
    expect(edited.body.rule.current.version).toBe(2);
    const versions = (await forecaster.agent.get(`/api/rules/${ruleId}/versions`)).body.versions;
    expect(versions.map((v: { version: number }) => v.version)).toEqual([2, 1]);
    expect(versions[0]).toMatchObject({ createdBy: "lead", changeNote: "wording" });
    const same = await lead.agent.put(`/api/rules/${ruleId}`).set("x-csrf-token", lead.csrf).send({ ...rule({ description: "Tuned" }), changeNote: "again" });
    expect(same.status).toBe(400);
  });

  it("does not let a forecaster edit rules", async () => {
    const res = await forecaster.agent.post("/api/rules").set("x-csrf-token", forecaster.csrf).send(rule());
    expect(res.status).toBe(403);
  });
});

describe("triggers from ingested frames", () => {
  it("opens one trigger for an event, extends it frame by frame, and links the evaluations", async () => {
    await ingestBytes(server, file("m1", "12", "6,7", 1), "a.grib2");
    await settle();
    const [trigger, ...rest] = await triggersOf("m1");
    expect(rest).toEqual([]);
    expect(trigger).toMatchObject({ state: "open", severity: "serious", firstValidTime: "2026-05-14T18:00:00.000Z", lastValidTime: "2026-05-14T19:00:00.000Z" });
    const detail = (await forecaster.agent.get(`/api/triggers/${trigger!.id}`)).body.trigger;
    expect(detail.rule).toMatchObject({ name: "Strong deep shear", version: 2 });
    expect(detail.frames).toHaveLength(2);
    expect(detail.frames[0].coveragePercent).toBe(100);
    const kinds = detail.events.map((e: { kind: string }) => e.kind);
    expect(kinds.filter((k: string) => !k.startsWith("notif"))).toEqual(["opened", "updated"]);
    // This test office has no contacts or on-call shifts: the trigger says so instead of failing silently.
    const unsent = detail.events.find((e: { kind: string }) => e.kind === "notify-failed");
    expect(unsent.note).toContain("No message was queued");
  });

  it("never opens a second trigger when the same frame is evaluated again", async () => {
    const frames = (await forecaster.agent.get("/api/grids/runs")).body.runs[0].frames;
    for (const f of frames) server.services.evaluation.enqueue(f.id);
    await settle();
    await server.services.evaluation.evaluateFrame(frames[0].id);
    expect(await triggersOf("m1")).toHaveLength(1);
    const evaluations = await server.dataSource.getRepository(RuleEvaluationEntity).countBy({ model: "m1" });
    expect(evaluations).toBe(2);
  });

  it("shows the matched area of a frame inside the zone", async () => {
    const [trigger] = await triggersOf("m1");
    const detail = (await forecaster.agent.get(`/api/triggers/${trigger!.id}`)).body.trigger;
    const res = await forecaster.agent.get(`/api/triggers/${trigger!.id}/frames/${detail.frames[0].frameId}/mask`);
    const g = res.body.geometry;
    const mask = decodeMaskBits(res.body.mask, g.nx * g.ny);
    expect(mask.reduce((a: number, b: number) => a + b, 0)).toBe(res.body.zone.summary.matchedPoints);
  });

  it("lets a forecaster acknowledge once, audited, and refuses a second acknowledgement", async () => {
    const [trigger] = await triggersOf("m1");
    const ack = await forecaster.agent.post(`/api/triggers/${trigger!.id}/acknowledge`).set("x-csrf-token", forecaster.csrf).send({ note: "Watching the west" });
    expect(ack.body.trigger).toMatchObject({ state: "acknowledged", acknowledgedBy: "forecaster" });
    const again = await forecaster.agent.post(`/api/triggers/${trigger!.id}/acknowledge`).set("x-csrf-token", forecaster.csrf).send({});
    expect(again.status).toBe(409);
    const manager = await signIn(server.app, "manager");
    const audit = (await manager.agent.get("/api/audit?action=trigger.acknowledged")).body.entries;
    expect(audit[0]).toMatchObject({ actor: "forecaster", targetId: String(trigger!.id) });
  });

  it("clears the trigger when a newer run no longer meets the rule at its valid times", async () => {
    await ingestBytes(server, file("m1", "13", "5,6", 0.1), "b.grib2");
    await settle();
    const [trigger] = await triggersOf("m1");
    expect(trigger).toMatchObject({ state: "cleared" });
    const kinds = (await forecaster.agent.get(`/api/triggers/${trigger!.id}`)).body.trigger.events.map((e: { kind: string }) => e.kind);
    expect(kinds.slice(-2)).toEqual(["updated", "cleared"]);
  });

  it("holds back a new trigger within the cool-down, then lets a rise in severity through", async () => {
    await ingestBytes(server, file("m1", "14", "5", 1), "c.grib2"); // valid 19Z: 0 h after the cleared event
    await settle();
    expect(await triggersOf("m1")).toHaveLength(1);
    await lead.agent.put(`/api/rules/${ruleId}`).set("x-csrf-token", lead.csrf).send({ ...rule({ description: "Tuned", severity: "urgent" }), changeNote: "raise" });
    await ingestBytes(server, file("m1", "15", "4", 1), "d.grib2");
    await settle();
    const list = await triggersOf("m1");
    expect(list).toHaveLength(2);
    expect(list[1]).toMatchObject({ severity: "urgent", state: "open" });
  });

  it("waits for K consecutive frames when the rule asks for persistence", async () => {
    await lead.agent.put(`/api/rules/${ruleId}`).set("x-csrf-token", lead.csrf).send({ ...rule({ description: "Tuned", severity: "urgent", persistenceFrames: 2 }), changeNote: "two hours" });
    await ingestBytes(server, file("m2", "12", "6", 1), "e.grib2");
    await settle();
    expect(await triggersOf("m2")).toHaveLength(0);
    await ingestBytes(server, file("m2", "12", "7", 1), "f.grib2");
    await settle();
    const [opened] = await triggersOf("m2");
    expect(opened).toMatchObject({ firstValidTime: "2026-05-14T18:00:00.000Z", lastValidTime: "2026-05-14T19:00:00.000Z" });
  });

  it("lets a lead close a trigger as a false alarm with a reason, and expires old ones", async () => {
    const [opened] = await triggersOf("m2");
    const closed = await lead.agent.post(`/api/triggers/${opened!.id}/false-alarm`).set("x-csrf-token", lead.csrf).send({ reason: "Model spin-up artefact" });
    expect(closed.body.trigger).toMatchObject({ state: "false-alarm", closeReason: "Model spin-up artefact" });
    const expired = await server.services.triggers.expireOld();
    expect(expired).toBeGreaterThanOrEqual(1); // the valid times of 2026-05-14 are long past
    const states = (await triggersOf("m1")).map((t) => t.state);
    expect(states).toContain("expired");
  });

  it("lists triggers with filters and a timeline with grid arrivals", async () => {
    const urgent = (await forecaster.agent.get("/api/triggers?severity=urgent")).body.triggers;
    expect(urgent.every((t: { severity: string }) => t.severity === "urgent")).toBe(true);
    const timeline = (await forecaster.agent.get("/api/timeline")).body.entries;
    expect(new Set(timeline.map((e: { kind: string }) => e.kind))).toEqual(new Set(["trigger", "grid"]));
    const times = timeline.map((e: { at: string }) => e.at);
    expect([...times].sort().reverse()).toEqual(times);
  });
});

describe("re-check after a restart", () => {
  it("queues only frames a current version has not evaluated, never those its window leaves out", async () => {
    const windowed = testRule([zoneId], { name: "Only the analysis hour", validTimeWindow: { kind: "forecast-hours", fromHour: 0, toHour: 0 } });
    expect((await lead.agent.post("/api/rules").set("x-csrf-token", lead.csrf).send(windowed)).status).toBe(201);
    await server.services.evaluation.recheckRecent(24);
    await settle();
    // Every due evaluation now exists; the windowed rule's frames (all past hour 0) are not "missing".
    expect(await server.services.evaluation.recheckRecent(24)).toBe(0);
  });
});

describe("preview and backtest", () => {
  it("previews an unsaved expression on the newest frame", async () => {
    const res = await lead.agent.post("/api/rules/preview").set("x-csrf-token", lead.csrf).send({ expression: "shear_0_6km >= 10", zoneIds: [zoneId] });
    expect(res.status).toBe(200);
    expect(res.body.zones[0].summary.zonePoints).toBeGreaterThan(0);
    const bad = await lead.agent.post("/api/rules/preview").set("x-csrf-token", lead.csrf).send({ expression: "shear_0_6km >=" });
    expect(bad.status).toBe(422);
  });

  it("backtests a version over stored runs without opening anything", async () => {
    const before = (await server.dataSource.getRepository(TriggerEntity).count());
    const res = await lead.agent.post(`/api/rules/${ruleId}/backtest`).set("x-csrf-token", lead.csrf).send({ runs: 10 });
    expect(res.status).toBe(200);
    expect(res.body.frames.length).toBeGreaterThan(3);
    expect(res.body.wouldOpen).toBeGreaterThanOrEqual(1);
    expect(await server.dataSource.getRepository(TriggerEntity).count()).toBe(before);
  });
});
