import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { SYSTEM_ACTOR } from "../../server/audit/audit-log.ts";
import { startTestServer, signIn, type SignedInAgent, type TestServer } from "../helpers/test-server.ts";
import { STORM_REPORT_CSV_HEADER } from "../../shared/storm-reports/storm-report-csv.ts";

const NOW = new Date("2026-05-15T03:00:00Z");
const csv = (...rows: string[]) => [STORM_REPORT_CSV_HEADER, ...rows].join("\n");
const GOOD = csv(
  "2026-05-14T21:35Z,35.51,-97.42,tornado,2,EF,Brief touchdown",
  "2026-05-14T21:40Z,35.60,-97.30,hail,1.75,in,Golf ball",
  "2026-05-14T21:41Z,35.601,-97.301,hail,45,mm,Same stones from a second spotter",
  "2026-05-14T21:50Z,95,-97.1,wind,65,kt,",
  "2026-05-14T22:10Z,35.9,-97.0,wind,,,\"Trees down, roads blocked\"",
);

let server: TestServer;
let manager: SignedInAgent;

beforeAll(async () => {
  server = await startTestServer({}, { now: () => NOW });
  manager = await signIn(server.app, "manager");
});
afterAll(async () => server.close());

describe("storm-report upload", () => {
  it("stores the good rows, lists refused rows and recognises a duplicate inside the file", async () => {
    const res = await manager.agent.post("/api/storm-reports").set("x-csrf-token", manager.csrf).attach("file", Buffer.from(GOOD), "spotters.csv");
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    expect(res.body.fileName).toBe("spotters.csv");
    expect(res.body.rows).toBe(5);
    expect(res.body.stored.map((r: { kind: string }) => r.kind)).toEqual(["tornado", "hail", "wind"]);
    expect(res.body.stored[0]).toMatchObject({ time: "2026-05-14T21:35:00.000Z", magnitude: 2, magnitudeUnit: "EF", uploadedBy: "manager", invented: false, source: "spotters.csv" });
    expect(res.body.duplicates).toEqual([{ line: 4, duplicateOfReportId: null, duplicateOfLine: 3 }]);
    expect(res.body.refused).toEqual([{ line: 5, reason: "latitude 95 is outside −90 to 90 degrees" }]);
  });

  it("recognises every row of the same file uploaded again as a duplicate of the stored report", async () => {
    const stored = (await manager.agent.get("/api/storm-reports")).body.reports;
    const res = await manager.agent.post("/api/storm-reports").set("x-csrf-token", manager.csrf).attach("file", Buffer.from(GOOD), "spotters-again.csv");
    expect(res.status).toBe(201);
    expect(res.body.stored).toEqual([]);
    expect(res.body.duplicates.map((d: { line: number; duplicateOfReportId: number }) => [d.line, d.duplicateOfReportId])).toEqual([
      [2, stored[0].id],
      [3, stored[1].id],
      [4, stored[1].id],
      [6, stored[2].id],
    ]);
  });

  it("records each upload in the audit trail", async () => {
    const audit = (await manager.agent.get("/api/audit?action=storm_reports.uploaded")).body.entries;
    expect(audit).toHaveLength(2);
    expect(audit[1].after).toMatchObject({ fileName: "spotters.csv", rows: 5, stored: 3, duplicates: 1, refused: 1 });
  });

  it("takes a text/csv body from a lead, refuses a forecaster, and refuses a file with the wrong header", async () => {
    const lead = await signIn(server.app, "lead");
    const body = csv("2026-05-14T23:00Z,36.2,-96.8,hail,1,in,");
    const res = await lead.agent.post("/api/storm-reports?fileName=lead.csv").set("x-csrf-token", lead.csrf).set("content-type", "text/csv").send(body);
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ fileName: "lead.csv", rows: 1 });
    const forecaster = await signIn(server.app, "forecaster");
    expect((await forecaster.agent.post("/api/storm-reports").set("x-csrf-token", forecaster.csrf).send({ csv: body })).status).toBe(403);
    const bad = await manager.agent.post("/api/storm-reports").set("x-csrf-token", manager.csrf).send({ csv: "when,lat,lon\n1,2,3" });
    expect(bad.status).toBe(422);
    expect(bad.body.error.code).toBe("STORM_REPORTS_INVALID");
    expect(bad.body.error.message).toContain(STORM_REPORT_CSV_HEADER);
  });

  it("lists reports for everyone, by period and kind, and shows them on the timeline", async () => {
    const forecaster = await signIn(server.app, "forecaster");
    const hail = await forecaster.agent.get("/api/storm-reports?kind=hail");
    expect(hail.body.reports.map((r: { time: string }) => r.time)).toEqual(["2026-05-14T21:40:00.000Z", "2026-05-14T23:00:00.000Z"]);
    const window = await forecaster.agent.get("/api/storm-reports?from=2026-05-14T21:36:00Z&to=2026-05-14T22:30:00Z");
    expect(window.body.reports).toHaveLength(2);
    const timeline = (await forecaster.agent.get("/api/timeline")).body.entries.filter((e: { kind: string }) => e.kind === "report");
    expect(timeline.map((e: { at: string; report: { kind: string } }) => `${e.at} ${e.report.kind}`)).toEqual([
      "2026-05-14T23:00:00.000Z hail",
      "2026-05-14T22:10:00.000Z wind",
      "2026-05-14T21:40:00.000Z hail",
      "2026-05-14T21:35:00.000Z tornado",
    ]);
  });

  it("puts a report on the timeline only once its time has come", async () => {
    const soon = new Date(NOW.getTime() + 2 * 3_600_000).toISOString();
    await server.services.stormReports.storeInvented(SYSTEM_ACTOR, "future", [
      { time: soon, latitude: 35, longitude: -98, kind: "hail", magnitude: 1, magnitudeUnit: "in", magnitudeSi: 0.0254, remarks: "Invented: not yet observed" },
    ]);
    const forecaster = await signIn(server.app, "forecaster");
    const reports = (await forecaster.agent.get("/api/storm-reports?kind=hail")).body.reports.map((r: { time: string }) => r.time);
    expect(reports).toContain(soon);
    const timeline = (await forecaster.agent.get("/api/timeline")).body.entries.filter((e: { kind: string }) => e.kind === "report");
    expect(timeline.map((e: { at: string }) => e.at)).not.toContain(soon);
  });
});
