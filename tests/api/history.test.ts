import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { startTestServer, signIn, type SignedInAgent, type TestServer } from "../helpers/test-server.ts";
import { insertEvent, insertNotification, insertTrigger } from "../helpers/history-fixtures.ts";
import { testRule } from "../helpers/rule-builder.ts";
import { SYSTEM_ACTOR } from "../../server/audit/audit-log.ts";
import type { ZoneGeometry } from "../../shared/zones/zone-geometry.ts";
import { splitCsvRecords } from "../../shared/csv/csv-text.ts";
import { HISTORY_CSV_HEADER } from "../../server/history/history-csv.ts";

const SQUARE = (west: number): ZoneGeometry => ({ type: "Polygon", coordinates: [[[west, 35], [west + 1, 35], [west + 1, 36], [west, 36], [west, 35]]] });
const at = (hhmm: string) => `2026-05-14T${hhmm}:00.000Z`;

let server: TestServer;
let manager: SignedInAgent;
let ids: Record<string, number>;
let rules: { shear: number; hail: number; shearVersion: number };

beforeAll(async () => {
  server = await startTestServer();
  manager = await signIn(server.app, "manager");
  const west = await server.services.zones.create(SYSTEM_ACTOR, { code: "WST", name: "West", geometry: SQUARE(-99) });
  const east = await server.services.zones.create(SYSTEM_ACTOR, { code: "EST", name: "East", geometry: SQUARE(-98) });
  const shear = await server.services.rules.create(SYSTEM_ACTOR, testRule([west.id, east.id]) as never);
  const hail = await server.services.rules.create(SYSTEM_ACTOR, testRule([east.id], { name: "Hail ingredients", expression: "mlcape >= 2000" }) as never);
  rules = { shear: shear.id, hail: hail.id, shearVersion: shear.current.id };
  const hailVersion = hail.current.id;
  // Acknowledged after 4, 10 and 30 minutes; one never acknowledged.
  ids = {
    a: await insertTrigger(server, { ruleId: shear.id, ruleVersionId: rules.shearVersion, zoneId: west.id, openedAt: at("17:00"), firstValidTime: at("18:00"), lastValidTime: at("20:00"), state: "acknowledged", acknowledgedBy: "forecaster", acknowledgedAt: at("17:04") }),
    b: await insertTrigger(server, { ruleId: shear.id, ruleVersionId: rules.shearVersion, zoneId: east.id, openedAt: at("17:30"), firstValidTime: at("18:00"), lastValidTime: at("21:00"), state: "acknowledged", acknowledgedBy: "lead", acknowledgedAt: at("17:40"), severity: "urgent" }),
    c: await insertTrigger(server, { ruleId: hail.id, ruleVersionId: hailVersion, zoneId: east.id, openedAt: at("18:00"), firstValidTime: at("19:00"), lastValidTime: at("19:00"), state: "expired", acknowledgedBy: "forecaster", acknowledgedAt: at("18:30"), severity: "heads-up" }),
    d: await insertTrigger(server, { ruleId: hail.id, ruleVersionId: hailVersion, zoneId: east.id, openedAt: at("23:00"), firstValidTime: at("23:00"), lastValidTime: at("23:00") }),
  };
  await insertEvent(server, ids.b!, "opened", at("17:30"));
  await insertEvent(server, ids.b!, "escalated", at("17:35"), null, "Nobody acknowledged within 5 minutes");
  await insertEvent(server, ids.b!, "acknowledged", at("17:40"), "lead", "On it");
  await insertEvent(server, ids.d!, "escalated", at("23:10"));
  await insertNotification(server, ids.b!, "sent", at("17:30"));
  await insertNotification(server, ids.b!, "failed", at("17:30"), 3);
  await insertNotification(server, ids.b!, "sent", at("17:35"));
});
afterAll(async () => server.close());

const list = async (query: string) => {
  const res = await manager.agent.get(`/api/history/triggers${query}`);
  expect(res.status, JSON.stringify(res.body)).toBe(200);
  return res.body;
};

describe("alert history", () => {
  it("lists every trigger newest first with the review's figures", async () => {
    const page = await list("");
    expect(page.triggers.map((t: { id: number }) => t.id)).toEqual([ids.d, ids.c, ids.b, ids.a]);
    expect(page.summary).toMatchObject({ triggers: 4, acknowledged: 3, escalations: 2, notificationFailures: 1, notificationsSent: 2 });
    // Derived in closed form (Hyndman and Fan 1996, definition 7): sorted [4, 10, 30]; median 10; p90 at h = 1.8 → 10 + 0.8·20 = 26
    expect(page.summary.minutesToAcknowledge.median).toBeCloseTo(10, 9);
    expect(page.summary.minutesToAcknowledge.p90).toBeCloseTo(26, 9);
    expect(page.summary.byRule).toEqual([
      { ruleId: rules.hail, ruleName: "Hail ingredients", count: 2 },
      { ruleId: rules.shear, ruleName: "Strong deep shear", count: 2 },
    ]);
    const b = page.triggers.find((t: { id: number }) => t.id === ids.b);
    expect(b).toMatchObject({ minutesToAcknowledge: 10, escalations: 1, notificationsSent: 2, notificationsFailed: 1, zone: { code: "EST" } });
    expect(page.acknowledgers).toEqual(["forecaster", "lead"]);
    expect(page.truncated).toBe(false);
  });

  it("filters by period, rule, version, zone, severity, state and who acknowledged", async () => {
    const idsOf = async (q: string) => (await list(q)).triggers.map((t: { id: number }) => t.id).sort();
    expect(await idsOf(`?from=${at("17:15")}&to=${at("18:00")}`)).toEqual([ids.b, ids.c].sort());
    expect(await idsOf(`?ruleId=${rules.hail}`)).toEqual([ids.c, ids.d].sort());
    expect(await idsOf(`?ruleVersionId=${rules.shearVersion}`)).toEqual([ids.a, ids.b].sort());
    expect(await idsOf(`?zoneId=${(await list("")).triggers.find((t: { id: number }) => t.id === ids.a).zone.id}`)).toEqual([ids.a]);
    expect(await idsOf("?severity=urgent")).toEqual([ids.b]);
    expect(await idsOf("?state=expired")).toEqual([ids.c]);
    expect(await idsOf("?acknowledgedBy=forecaster")).toEqual([ids.a, ids.c].sort());
    expect(await idsOf("?acknowledgedBy=none")).toEqual([ids.d]);
    const narrowed = await list("?acknowledgedBy=forecaster");
    // Derived in closed form: only 4 and 30 minutes remain → median 17
    expect(narrowed.summary.minutesToAcknowledge.median).toBeCloseTo(17, 9);
  });

  it("refuses a bad filter with the field named", async () => {
    const res = await manager.agent.get("/api/history/triggers?severity=extreme");
    expect(res.status).toBe(400);
    expect(res.body.error.message).toContain("severity");
  });

  it("tells one trigger's story: events and messages in time order, with every delivery attempt", async () => {
    const res = await manager.agent.get(`/api/history/triggers/${ids.b}`);
    expect(res.status).toBe(200);
    const story = res.body.timeline.map((item: { kind: string; event?: { kind: string }; notification?: { state: string } }) =>
      item.kind === "event" ? `event:${item.event!.kind}` : `message:${item.notification!.state}`,
    );
    expect(story).toEqual(["event:opened", "message:sent", "message:failed", "event:escalated", "message:sent", "event:acknowledged"]);
    const failed = res.body.timeline.find((item: { kind: string; notification?: { state: string } }) => item.notification?.state === "failed").notification;
    expect(failed.deliveries.map((d: { outcome: string }) => d.outcome)).toEqual(["retry", "retry", "failed"]);
    expect(failed.lastError).toBe("provider refused the number");
    expect((await manager.agent.get("/api/history/triggers/99999")).status).toBe(404);
  });
});

describe("trigger history CSV", () => {
  it("exports the filtered set with a header row", async () => {
    const res = await manager.agent.get(`/api/history/triggers.csv?ruleId=${rules.shear}`);
    expect(res.status).toBe(200);
    expect(res.headers["content-type"]).toMatch(/^text\/csv/);
    expect(res.headers["content-disposition"]).toMatch(/attachment; filename="bellwether-trigger-history-\d{8}-\d{4}Z\.csv"/);
    const [header, ...rows] = splitCsvRecords(res.text);
    expect(header!.cells).toEqual([...HISTORY_CSV_HEADER]);
    expect(rows.map((r) => Number(r.cells[0]))).toEqual([ids.b, ids.a]);
    const b = Object.fromEntries(HISTORY_CSV_HEADER.map((key, k) => [key, rows[0]!.cells[k]]));
    expect(b).toMatchObject({ rule_name: "Strong deep shear", zone_code: "EST", severity: "urgent", acknowledged_by: "lead", minutes_to_acknowledge: "10", escalations: "1", notifications_failed: "1" });
  });

  it("is for managers and admins only", async () => {
    for (const who of ["forecaster", "lead"]) {
      const agent = await signIn(server.app, who);
      expect((await agent.agent.get("/api/history/triggers.csv")).status).toBe(403);
    }
    const admin = await signIn(server.app, "admin");
    expect((await admin.agent.get("/api/history/triggers.csv")).status).toBe(200);
  });
});
