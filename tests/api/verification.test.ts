import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { startTestServer, signIn, ingestBytes, type SignedInAgent, type TestServer } from "../helpers/test-server.ts";
import { insertTrigger } from "../helpers/history-fixtures.ts";
import { testRule } from "../helpers/rule-builder.ts";
import { fakeGribBytes, syntheticRecords } from "../helpers/synthetic-grid.ts";
import { SYSTEM_ACTOR } from "../../server/audit/audit-log.ts";
import type { ZoneGeometry } from "../../shared/zones/zone-geometry.ts";
import { TriggerEntity } from "../../server/entities/trigger.entity.ts";
import { STORM_REPORT_CSV_HEADER } from "../../shared/storm-reports/storm-report-csv.ts";

/**
 * Verification end to end on hand-built triggers and uploaded reports. The expected counts follow
 * from the documented matching rules (README, "History and verification"), worked out by hand:
 *
 *   zones WEST 99–98° W and EAST 98–97° W, 35–36° N; rule "Strong deep shear" covers both.
 *   T1 WEST opened 17:00, valid 18–20     T2 EAST opened 16:00, valid 18–20
 *   T3 WEST opened 22:00, valid 23–23 (version 2, saved at 21:45)
 *   r1 19:00 on the shared edge (98° W) → verifies T1 and T2, lead from 16:00 = 180 min
 *   r2 19:30 in EAST → T2, 210 min        r3 21:30 in WEST → after T1's window (ends 21:00): miss
 *   r4 19:00 east of every zone → outside the rule's area, not scored
 */
const SQUARE = (west: number): ZoneGeometry => ({ type: "Polygon", coordinates: [[[west, 35], [west + 1, 35], [west + 1, 36], [west, 36], [west, 35]]] });
const at = (hhmm: string) => `2026-05-14T${hhmm}:00.000Z`;
const PERIOD = `from=${at("12:00")}&to=${at("23:59")}`;

let clock = new Date(at("06:00"));
let server: TestServer;
let manager: SignedInAgent;
let ruleId: number;
let v1: number;
let v2: number;
let t: Record<string, number>;
let reportIds: number[];

/** Grid "files" name their model, run (ISO) and valid hours (as in rules-triggers.test.ts). */
function decodeByTag(bytes: Uint8Array) {
  const [model, runTime, hours] = Buffer.from(bytes).toString("latin1").slice(8).split("|") as [string, string, string];
  const validTimes = hours!.split(",").map((h) => new Date(Date.parse(runTime) + Number(h) * 3_600_000).toISOString());
  return syntheticRecords({ model, runTime, validTimes });
}

beforeAll(async () => {
  server = await startTestServer({}, { now: () => clock, decode: decodeByTag });
  manager = await signIn(server.app, "manager");
  const west = await server.services.zones.create(SYSTEM_ACTOR, { code: "WST", name: "West", geometry: SQUARE(-99) });
  const east = await server.services.zones.create(SYSTEM_ACTOR, { code: "EST", name: "East", geometry: SQUARE(-98) });
  const rule = await server.services.rules.create(SYSTEM_ACTOR, testRule([west.id, east.id], { enabled: false }) as never);
  ruleId = rule.id;
  v1 = rule.current.id;
  clock = new Date(at("21:45"));
  v2 = (await server.services.rules.update(SYSTEM_ACTOR, ruleId, { ...testRule([west.id, east.id], { enabled: false, description: "v2" }), changeNote: "tuned" } as never)).current.id;
  t = {
    t1: await insertTrigger(server, { ruleId, ruleVersionId: v1, zoneId: west.id, openedAt: at("17:00"), firstValidTime: at("18:00"), lastValidTime: at("20:00") }),
    t2: await insertTrigger(server, { ruleId, ruleVersionId: v1, zoneId: east.id, openedAt: at("16:00"), firstValidTime: at("18:00"), lastValidTime: at("20:00") }),
    t3: await insertTrigger(server, { ruleId, ruleVersionId: v2, zoneId: west.id, openedAt: at("22:00"), firstValidTime: at("23:00"), lastValidTime: at("23:00") }),
  };
  clock = new Date(at("23:59"));
  const upload = await manager.agent
    .post("/api/storm-reports")
    .set("x-csrf-token", manager.csrf)
    .send({
      csv: [
        STORM_REPORT_CSV_HEADER,
        `${at("19:00")},35.5,-98.0,hail,1,in,r1 on the edge`,
        `${at("19:30")},35.5,-97.5,tornado,1,EF,r2 in EAST`,
        `${at("21:30")},35.5,-98.5,wind,60,kt,r3 late in WEST`,
        `${at("19:00")},35.5,-96.5,hail,1,in,r4 outside`,
      ].join("\n"),
    });
  expect(upload.status).toBe(201);
  reportIds = upload.body.stored.map((r: { id: number }) => r.id);
});
afterAll(async () => server.close());

const verify = async (query: string, period = PERIOD) => {
  const res = await manager.agent.get(`/api/verification?${period}&${query}`);
  expect(res.status, JSON.stringify(res.body)).toBe(200);
  return res.body;
};

describe("verification against storm reports", () => {
  it("scores a rule: hits, misses, false alarms, POD, FAR, CSI, bias and lead times", async () => {
    const body = await verify(`ruleId=${ruleId}`);
    expect(body.options).toEqual({ space: "zone", distanceKm: 0, windowHours: 1, kinds: ["tornado", "hail", "wind"] });
    expect(body.overall.counts).toEqual({ verifiedTriggers: 2, falseAlarms: 1, detectedReports: 2, misses: 1 });
    // Derived in closed form: POD 2/3, FAR 1/3, CSI = 1/(3/2 + 3/2 − 1) = 1/2, bias = 3 triggers / 3 reports
    expect(body.overall.scores.pod).toBeCloseTo(2 / 3, 12);
    expect(body.overall.scores.far).toBeCloseTo(1 / 3, 12);
    expect(body.overall.scores.csi).toBeCloseTo(0.5, 12);
    expect(body.overall.scores.bias).toBeCloseTo(1, 12);
    expect(body.overall.leadTime).toEqual({ median: 195, p90: expect.closeTo(207, 9), minutes: [180, 210] });
    const outcome = Object.fromEntries(body.reports.map((r: { remarks: string; outcome: string; triggerIds: number[] }) => [r.remarks, [r.outcome, r.triggerIds]]));
    expect(outcome).toEqual({ "r1 on the edge": ["detected", [t.t2, t.t1]], "r2 in EAST": ["detected", [t.t2]], "r3 late in WEST": ["missed", []] });
    expect(body.triggers.map((x: { id: number; verified: boolean }) => [x.id, x.verified])).toEqual([
      [t.t2, true],
      [t.t1, true],
      [t.t3, false],
    ]);
    expect(body.zones.map((z: { code: string }) => z.code).sort()).toEqual(["EST", "WST"]);
  });

  it("scores each version over the reports of the time it was current", async () => {
    const body = await verify(`ruleId=${ruleId}`);
    const row = (id: number) => body.byVersion.find((r: { versionId: number }) => r.versionId === id);
    // v1 was current until 21:45: r1, r2 detected, r3 (21:30) missed; v2 from 21:45: only T3, no report
    expect(row(v1).counts).toEqual({ verifiedTriggers: 2, falseAlarms: 0, detectedReports: 2, misses: 1 });
    expect(row(v2).counts).toEqual({ verifiedTriggers: 0, falseAlarms: 1, detectedReports: 0, misses: 0 });
    expect(row(v2).scores).toMatchObject({ pod: null, far: 1, csi: null });
    const onlyV1 = await verify(`ruleVersionId=${v1}`);
    expect(onlyV1.overall.counts).toEqual(row(v1).counts);
    expect(body.byRule).toHaveLength(1);
  });

  it("widens the window and the distance as asked, and filters report kinds", async () => {
    // A 2 h window reaches r3 (21:30 ≤ 20:00 + 2 h): every report detected
    expect((await verify(`ruleId=${ruleId}&windowHours=2`)).overall.counts).toEqual({ verifiedTriggers: 2, falseAlarms: 1, detectedReports: 3, misses: 0 });
    // 50 km beyond the zones brings r4 (0.5° east of EAST ≈ 45 km) into the rule's area and into T2's reach
    expect((await verify(`ruleId=${ruleId}&distanceKm=50`)).overall.counts).toEqual({ verifiedTriggers: 2, falseAlarms: 1, detectedReports: 3, misses: 1 });
    expect((await verify(`ruleId=${ruleId}&kinds=tornado`)).overall.counts).toEqual({ verifiedTriggers: 1, falseAlarms: 2, detectedReports: 1, misses: 0 });
  });

  it("counts a report for the version whose trigger detected it, even after the next version was saved", async () => {
    // r6 at 22:20 in EAST falls after v2 was saved (21:45) but inside v1's trigger T2 with a 3 h window (ends 23:00)
    clock = new Date(at("23:59"));
    const upload = await manager.agent
      .post("/api/storm-reports")
      .set("x-csrf-token", manager.csrf)
      .send({ csv: [STORM_REPORT_CSV_HEADER, `${at("22:20")},35.5,-97.5,wind,55,kt,r6 late evening in EAST`].join("\n") });
    expect(upload.body.stored).toHaveLength(1);
    const body = await verify(`ruleId=${ruleId}&windowHours=3`);
    const row = (id: number) => body.byVersion.find((r: { versionId: number }) => r.versionId === id);
    expect(row(v1).counts).toEqual({ verifiedTriggers: 2, falseAlarms: 0, detectedReports: 4, misses: 0 });
    expect(row(v2).counts).toEqual({ verifiedTriggers: 0, falseAlarms: 1, detectedReports: 0, misses: 0 });
    // Derived in closed form: r6 − T2's opening = 22:20 − 16:00 = 380 min
    expect(body.reports.find((r: { remarks: string }) => r.remarks.startsWith("r6")).leadMinutes).toBe(380);
    const onlyV2 = await verify(`ruleVersionId=${v2}&windowHours=3`);
    expect(onlyV2.reports).toEqual([]);
    expect(onlyV2.triggers.map((x: { id: number }) => x.id)).toEqual([t.t3]);
  });

  it("refuses a bad query and is for leads, managers and admins", async () => {
    expect((await manager.agent.get(`/api/verification?from=${at("20:00")}&to=${at("19:00")}`)).status).toBe(400);
    expect((await manager.agent.get(`/api/verification?${PERIOD}&kinds=hail,funnel`)).status).toBe(400);
    const forecaster = await signIn(server.app, "forecaster");
    expect((await forecaster.agent.get(`/api/verification?${PERIOD}`)).status).toBe(403);
    const lead = await signIn(server.app, "lead");
    expect((await lead.agent.get(`/api/verification?${PERIOD}`)).status).toBe(200);
  });
});

describe("verification on stored frames", () => {
  // A 6 × 5 grid over 34–36° N, 100–97.5° W where deep shear exceeds 10 m/s everywhere, a day
  // before the reports above, so the two scenarios never meet.
  const GRID_ZONE: ZoneGeometry = { type: "Polygon", coordinates: [[[-100.1, 33.9], [-97.4, 33.9], [-97.4, 36.1], [-100.1, 36.1], [-100.1, 33.9]]] };
  let gridRule: number;
  let met: number;
  let never: number;

  beforeAll(async () => {
    clock = new Date("2026-05-13T12:30:00Z");
    const zone = await server.services.zones.create(SYSTEM_ACTOR, { code: "GRD", name: "Grid", geometry: GRID_ZONE });
    const rule = await server.services.rules.create(SYSTEM_ACTOR, testRule([zone.id], { name: "Grid shear", expression: "shear_0_6km >= 1000" }) as never);
    gridRule = rule.id;
    never = rule.current.id;
    met = (await server.services.rules.update(SYSTEM_ACTOR, gridRule, { ...testRule([zone.id], { name: "Grid shear" }), changeNote: "lower" } as never)).current.id;
    await ingestBytes(server, fakeGribBytes("grid|2026-05-13T12:00:00.000Z|6,7,8"), "grid.grib2");
    await server.services.evaluation.idle();
    clock = new Date("2026-05-14T00:00:00Z");
    await manager.agent
      .post("/api/storm-reports")
      .set("x-csrf-token", manager.csrf)
      .send({ csv: [STORM_REPORT_CSV_HEADER, "2026-05-13T18:30Z,35.0,-99.0,hail,2,in,grid hail", "2026-05-13T19:10Z,35.5,-98.0,wind,55,kt,grid wind"].join("\n") });
  });

  it("matches reports to the area where the rule matched", async () => {
    const triggers = await server.dataSource.getRepository(TriggerEntity).find({ where: { ruleId: gridRule } });
    expect(triggers).toHaveLength(1);
    const body = await verify(`ruleId=${gridRule}&space=area&distanceKm=30`, "from=2026-05-13T00:00:00Z&to=2026-05-13T23:59:00Z");
    expect(body.options).toMatchObject({ space: "area", distanceKm: 30 });
    expect(body.overall.counts).toEqual({ verifiedTriggers: 1, falseAlarms: 0, detectedReports: 2, misses: 0 });
    expect(body.triggers[0].usedZoneInstead).toBe(false);
    // Opened when the 18Z frame was evaluated at the 12:30 clock: 18:30 − 12:30 = 360 min, 19:10 − 12:30 = 400 min
    expect(body.overall.leadTime.minutes).toEqual([360, 400]);
  });

  it("compares two versions over the same frames and reports, notifying no one", async () => {
    const res = await manager.agent.get(`/api/verification/compare?ruleId=${gridRule}&versionA=${never}&versionB=${met}&runs=1`);
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    const [a, b] = res.body.versions;
    expect(res.body.frames).toBe(3);
    expect(res.body.runs).toEqual([{ model: "grid", runTime: "2026-05-13T12:00:00.000Z" }]);
    expect(a).toMatchObject({ versionId: never, triggers: [], counts: { verifiedTriggers: 0, falseAlarms: 0, detectedReports: 0, misses: 2 } });
    expect(b.triggers).toHaveLength(1);
    expect(b.triggers[0]).toMatchObject({ zoneCode: "GRD", firstValidTime: "2026-05-13T18:00:00.000Z", lastValidTime: "2026-05-13T20:00:00.000Z", verified: true });
    expect(b.counts).toEqual({ verifiedTriggers: 1, falseAlarms: 0, detectedReports: 2, misses: 0 });
    // The run was stored months after its initial time (an archive), so the simulated trigger opens at
    // the run time, 12:00: lead times 18:30 − 12:00 = 390 min and 19:10 − 12:00 = 430 min
    expect(b.triggers[0].openedAt).toBe("2026-05-13T12:00:00.000Z");
    expect(b.leadTime.minutes).toEqual([390, 430]);
    expect(res.body.reports.map((r: { detectedBy: number[] }) => r.detectedBy)).toEqual([[met], [met]]);
    const area = await manager.agent.get(`/api/verification/compare?ruleId=${gridRule}&versionA=${never}&versionB=${met}&runs=1&space=area&distanceKm=30`);
    expect(area.body.versions[1].counts.detectedReports).toBe(2);
    const forecaster = await signIn(server.app, "forecaster");
    expect((await forecaster.agent.get(`/api/verification/compare?ruleId=${gridRule}&versionA=${never}&versionB=${met}`)).status).toBe(403);
  });
});
