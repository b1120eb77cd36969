import { afterAll, beforeAll, describe, expect, it } from "vitest";
import Database from "better-sqlite3";
import { startTestServer, signIn, type SignedInAgent, type TestServer } from "../helpers/test-server.ts";
import { splitCsvRecords } from "../../shared/csv/csv-text.ts";
import { AUDIT_CSV_HEADER } from "../../server/audit/audit-export.ts";
import { GENESIS_HASH, hashAuditRow } from "../../server/audit/audit-hash.ts";
import { runAuditVerification } from "../../jobs/scheduler.ts";
import { createLogger } from "../../server/logger.ts";

let server: TestServer;
let manager: SignedInAgent;

beforeAll(async () => {
  server = await startTestServer();
  manager = await signIn(server.app, "manager");
  const admin = await signIn(server.app, "admin");
  await admin.agent.post("/api/users").set("x-csrf-token", admin.csrf).send({ username: "export-probe", displayName: "Probe, with a comma", password: "probe-password-1", roles: ["manager"] });
  await admin.agent.patch("/api/users/2").set("x-csrf-token", admin.csrf).send({ displayName: 'Renamed "forecaster"' });
});
afterAll(async () => server.close());

const nullable = (cell: string) => (cell === "" ? null : cell);

describe("audit export", () => {
  it("exports the filtered trail as CSV that recomputes to the same hash chain", async () => {
    const res = await manager.agent.get("/api/audit/export.csv");
    expect(res.status).toBe(200);
    expect(res.headers["content-type"]).toMatch(/^text\/csv/);
    expect(res.headers["content-disposition"]).toMatch(/filename="bellwether-audit-/);
    const [header, ...rows] = splitCsvRecords(res.text);
    expect(header!.cells).toEqual([...AUDIT_CSV_HEADER]);
    expect(rows.length).toBeGreaterThan(5);
    // Source: the chain's own definition (server/audit/audit-hash.ts): each row hashes its content and the previous hash
    let prev = GENESIS_HASH;
    for (const { cells } of rows) {
      const [, at, actor, actorRoles, action, targetType, targetId, beforeJson, afterJson, requestId, prevHash, hash] = cells as string[];
      expect(prevHash).toBe(prev);
      expect(hashAuditRow({ at: at!, actor: nullable(actor!), actorRoles: actorRoles!, action: action!, targetType: targetType!, targetId: nullable(targetId!), beforeJson: nullable(beforeJson!), afterJson: nullable(afterJson!), requestId: nullable(requestId!), prevHash: prevHash! })).toBe(hash);
      prev = hash!;
    }
  });

  it("applies the screen's filters", async () => {
    const res = await manager.agent.get("/api/audit/export.csv?action=user.updated&actor=admin");
    const rows = splitCsvRecords(res.text).slice(1);
    expect(rows).toHaveLength(1);
    expect(JSON.parse(rows[0]!.cells[8]!).displayName).toBe('Renamed "forecaster"');
  });

  it("is for managers and admins only", async () => {
    for (const who of ["forecaster", "lead"]) {
      const agent = await signIn(server.app, who);
      expect((await agent.agent.get("/api/audit/export.csv")).status).toBe(403);
    }
    const admin = await signIn(server.app, "admin");
    expect((await admin.agent.get("/api/audit/export.csv")).status).toBe(200);
  });
});

describe("nightly chain verification job", () => {
  const ctx = () => ({ dataSource: server.dataSource, logger: createLogger("silent"), services: server.services });

  it("records an intact chain in the trail itself", async () => {
    await runAuditVerification(ctx());
    const [entry] = (await manager.agent.get("/api/audit?action=audit.verif&pageSize=1")).body.entries;
    expect(entry).toMatchObject({ action: "audit.verified", actor: null, actorRoles: ["system"], targetType: "audit" });
    expect(entry.after.ok).toBe(true);
    expect(entry.after.checked).toBeGreaterThan(5);
  });

  it("records a broken chain, naming the first broken entry", async () => {
    const db = new Database(server.config.databaseFile);
    try {
      db.exec("DROP TRIGGER audit_entries_no_update");
      db.prepare("UPDATE audit_entries SET action = 'user.forged' WHERE id = 2").run();
    } finally {
      db.close();
    }
    await runAuditVerification(ctx());
    const [entry] = (await manager.agent.get("/api/audit?action=audit.verify_failed&pageSize=1")).body.entries;
    expect(entry.after).toEqual({ ok: false, checked: 1, firstBroken: 2 });
    expect((await manager.agent.get("/api/audit/verify")).body).toEqual({ ok: false, checked: 1, firstBroken: 2 });
  });
});
