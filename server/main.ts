import fs from "node:fs";
import path from "node:path";
import http from "node:http";
import type { AddressInfo } from "node:net";
import { fileURLToPath } from "node:url";
import type { DataSource } from "typeorm";
import type { Logger } from "pino";
import type { Express } from "express";
import { loadConfig, type AppConfig } from "./config.ts";
import { openDatabase } from "./db/data-source.ts";
import { createLogger } from "./logger.ts";
import { resolveSessionSecret } from "./session-secret.ts";
import { createApp } from "./app.ts";
import { isNewDatabase, seedDemoAccounts, seedDemoOffice, seedFirstAdmin } from "./demo/seed.ts";
import { startScheduler, type Scheduler } from "../jobs/scheduler.ts";
import { createServices, type Services } from "./services/container.ts";
import { dropDemoRun } from "./demo/drop-demo-run.ts";
import { defaultDemoRun } from "./demo/demo-run.ts";

export const CLIENT_DIR = fileURLToPath(new URL("../dist/client", import.meta.url));

export interface RunningBellwether {
  url: string;
  port: number;
  config: AppConfig;
  app: Express;
  dataSource: DataSource;
  logger: Logger;
  services: Services;
  close(): Promise<void>;
}

/** Opens the database (migrating it), seeds a new one, serves API + client, starts the jobs. */
export async function startBellwether(overrides: Partial<Record<string, string>> = {}): Promise<RunningBellwether> {
  const config = loadConfig(process.env, overrides);
  const logger = createLogger(config.LOG_LEVEL);
  fs.mkdirSync(config.dataDir, { recursive: true });
  const dataSource = await openDatabase({ database: config.databaseFile });

  const newDatabase = await isNewDatabase(dataSource);
  if (newDatabase) {
    if (config.ADMIN_USERNAME && config.ADMIN_PASSWORD) {
      await seedFirstAdmin(dataSource, config.ADMIN_USERNAME, config.ADMIN_PASSWORD, config.BCRYPT_COST);
      logger.info({ username: config.ADMIN_USERNAME }, "first-run administrator created");
    }
    if (config.DEMO) {
      await seedDemoAccounts(dataSource, config.DEMO_PASSWORD, config.BCRYPT_COST);
      logger.info("demo scenario seeded (invented office, staff and data)");
    }
  }

  const sessionSecret = resolveSessionSecret(config.dataDir, config.SESSION_SECRET);
  const services = createServices(config, dataSource, logger);
  if (newDatabase && config.DEMO) await seedDemoOffice(services);
  const { app } = createApp({ services, sessionSecret, clientDir: CLIENT_DIR });
  const server = http.createServer(app);
  await new Promise<void>((resolve, reject) => {
    server.once("error", reject);
    server.listen(config.PORT, config.HOST, () => resolve());
  });
  const port = (server.address() as AddressInfo).port;
  const resumed = await services.ingest.resumeUnfinished();
  if (resumed > 0) logger.info({ resumed }, "resumed unfinished ingest jobs");
  const scheduler: Scheduler | null = config.JOBS ? startScheduler({ dataSource, logger, services }) : null;
  const url = `http://${config.HOST === "0.0.0.0" ? "127.0.0.1" : config.HOST}:${port}`;
  logger.info({ url }, "Bellwether is serving");
  // Mail and text senders: the local fakes start here when no real credentials are configured.
  const notifyStart = await services.notify.start(url);
  logger.info({ mail: services.notify.transportKinds.mail, sms: services.notify.transportKinds.sms, fakes: services.notify.fakes.status(), resumed: notifyStart.resumed }, "notification transports ready");
  if (newDatabase && config.DEMO && config.DEMO_GRIDS) {
    // The invented demo run lands in the inbox like real model output, a file per forecast hour.
    dropDemoRun(config.inboxDir, defaultDemoRun(new Date())).then(
      (files) => logger.info({ files: files.length, inbox: config.inboxDir }, "demo model run dropped into the inbox"),
      (err) => logger.error({ err }, "could not write the demo model run"),
    );
  }

  let closing: Promise<void> | null = null;
  const close = () =>
    (closing ??= (async () => {
      await scheduler?.stop();
      await services.close();
      server.closeAllConnections();
      await new Promise<void>((resolve) => server.close(() => resolve()));
      await dataSource.destroy();
    })());
  return { url, port, config, app, dataSource, logger, services, close };
}

/** Runs until SIGINT/SIGTERM, then shuts down cleanly. */
export async function runUntilSignalled(): Promise<void> {
  const running = await startBellwether();
  const stop = async (signal: string) => {
    running.logger.info({ signal }, "shutting down");
    await running.close();
    process.exit(0);
  };
  process.once("SIGINT", () => void stop("SIGINT"));
  process.once("SIGTERM", () => void stop("SIGTERM"));
}

const invokedDirectly = process.argv[1] && path.resolve(process.argv[1]) === fileURLToPath(import.meta.url);
if (invokedDirectly) {
  runUntilSignalled().catch((err) => {
    console.error(err instanceof Error ? err.message : err);
    process.exit(1);
  });
}
