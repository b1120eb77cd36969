import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import request from "supertest";
import type { DataSource } from "typeorm";
import type { Express } from "express";
import { loadConfig, type AppConfig } from "../../server/config.ts";
import { openDatabase } from "../../server/db/data-source.ts";
import { createApp } from "../../server/app.ts";
import { createLogger } from "../../server/logger.ts";
import { seedDemoAccounts } from "../../server/demo/seed.ts";
import type { RouteEntry } from "../../server/http/route-table.ts";
import { createServices, type ServiceOverrides, type Services } from "../../server/services/container.ts";
import type { Role } from "../../shared/auth/permissions.ts";

export const TEST_PASSWORD = "test-password-123";

export interface TestServer {
  app: Express;
  routes: RouteEntry[];
  dataSource: DataSource;
  config: AppConfig;
  dataDir: string;
  services: Services;
  close(): Promise<void>;
}

/** A real app on a real SQLite file in a fresh temporary folder, migrated and seeded with the demo accounts. */
export async function startTestServer(env: Record<string, string> = {}, overrides: ServiceOverrides = {}): Promise<TestServer> {
  const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), "bellwether-test-"));
  const config = loadConfig({}, { DATA_DIR: dataDir, LOG_LEVEL: "silent", DEMO_PASSWORD: TEST_PASSWORD, LOGIN_RATE_LIMIT: "1000", JOBS: "false", DIAGNOSTIC_THREADS: "1", ...env });
  const dataSource = await openDatabase({ database: config.databaseFile });
  await seedDemoAccounts(dataSource, TEST_PASSWORD, config.BCRYPT_COST);
  const services = createServices(config, dataSource, createLogger("silent"), overrides);
  const { app, routes } = createApp({ services, sessionSecret: "x".repeat(48) });
  return {
    app,
    routes,
    dataSource,
    config,
    dataDir,
    services,
    async close() {
      await services.close();
      await dataSource.destroy();
      fs.rmSync(dataDir, { recursive: true, force: true });
    },
  };
}

export const DEMO_USER_FOR_ROLE: Record<Role, string> = { lead: "lead", forecaster: "forecaster", manager: "manager", admin: "admin" };

export interface SignedInAgent {
  agent: ReturnType<typeof request.agent>;
  csrf: string;
}

/** Signs in through the public API exactly as a script would: login, then fetch the CSRF token. */
export async function signIn(app: Express, username: string, password = TEST_PASSWORD): Promise<SignedInAgent> {
  const agent = request.agent(app);
  const login = await agent.post("/api/auth/login").send({ username, password });
  if (login.status !== 200) throw new Error(`sign-in as ${username} failed: ${login.status} ${JSON.stringify(login.body)}`);
  const csrf = await agent.get("/api/auth/csrf");
  return { agent, csrf: csrf.body.token as string };
}

/** An anonymous agent that already holds a CSRF token (so a 401 is about the session, not CSRF). */
export async function anonymous(app: Express): Promise<SignedInAgent> {
  const agent = request.agent(app);
  const csrf = await agent.get("/api/auth/csrf");
  return { agent, csrf: csrf.body.token as string };
}

/** Puts bytes through the real ingest service as if they had landed in the inbox, and waits for the job. */
export async function ingestBytes(server: TestServer, bytes: Buffer, name: string) {
  const file = path.join(server.dataDir, `submit-${Date.now()}-${Math.random().toString(36).slice(2)}`);
  fs.writeFileSync(file, bytes);
  const result = await server.services.ingest.submitFile(file, { originalName: name, source: "inbox", submittedBy: null });
  await server.services.ingest.idle();
  return result;
}

let fixtureTriggers = 0;
/** An open trigger row made directly, for tests that need one to act on (the engine's own path is tested elsewhere). */
export async function insertOpenTrigger(server: Pick<TestServer, "dataSource">, ruleId: number, zoneId: number): Promise<number> {
  const { TriggerEntity } = await import("../../server/entities/trigger.entity.ts");
  const { RuleEntity } = await import("../../server/entities/rule.entity.ts");
  const rule = await server.dataSource.getRepository(RuleEntity).findOneByOrFail({ id: ruleId });
  const at = new Date().toISOString();
  const saved = await server.dataSource.getRepository(TriggerEntity).save({
    triggerKey: `fixture-${++fixtureTriggers}-${Date.now()}`,
    ruleId,
    ruleVersionId: rule.currentVersionId!,
    zoneId,
    severity: "serious",
    state: "open",
    model: "fixture",
    runTime: at,
    firstValidTime: at,
    lastValidTime: at,
    matchedValidTimes: JSON.stringify([at]),
    peak: JSON.stringify({ coveragePercent: 50, matchedPoints: 3, fields: [] }),
    openedAt: at,
    updatedAt: at,
    acknowledgedBy: null,
    acknowledgedAt: null,
    closedAt: null,
    closedBy: null,
    closeReason: null,
  });
  return saved.id;
}
