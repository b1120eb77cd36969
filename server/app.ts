import express, { type Express } from "express";
import cookieParser from "cookie-parser";
import { pinoHttp } from "pino-http";
import { randomUUID } from "node:crypto";
import fs from "node:fs";
import path from "node:path";
import { createPassport } from "./auth/passport-setup.ts";
import { createSessionMiddleware } from "./auth/session-middleware.ts";
import { createCsrf } from "./auth/csrf.ts";
import { securityHeaders } from "./http/security.ts";
import { apiNotFound, errorHandler } from "./http/error-handler.ts";
import type { RouteEntry } from "./http/route-table.ts";
import type { Services } from "./services/container.ts";
import { createGridsRouter } from "./routes/grids.router.ts";
import { createEventsRouter } from "./routes/events.router.ts";
import { createSoundingsRouter } from "./routes/soundings.router.ts";
import { createZonesRouter } from "./routes/zones.router.ts";
import { createRulesRouter } from "./routes/rules.router.ts";
import { createTimelineRouter, createTriggersRouter } from "./routes/triggers.router.ts";
import { createHealthRouter } from "./routes/health.router.ts";
import { createAuthRouter } from "./routes/auth.router.ts";
import { createUsersRouter } from "./routes/users.router.ts";
import { createAuditRouter } from "./routes/audit.router.ts";
import { createNotificationRouters } from "./routes/notifications.router.ts";
import { createHistoryRouter } from "./routes/history.router.ts";
import { createStormReportsRouter } from "./routes/storm-reports.router.ts";
import { createVerificationRouter } from "./routes/verification.router.ts";

export interface AppDeps {
  services: Services;
  sessionSecret: string;
  /** Folder of the built client; when absent the API still serves. */
  clientDir?: string;
}

export interface BellwetherApp {
  app: Express;
  /** Every API route with its access rule, as registered. */
  routes: RouteEntry[];
}

/** Builds the Express application. It never listens: main.ts and tests do that. */
export function createApp(deps: AppDeps): BellwetherApp {
  const { services } = deps;
  const { config, dataSource, logger } = services;
  const app = express();
  const routes: RouteEntry[] = [];
  app.disable("x-powered-by");
  app.set("trust proxy", "loopback");

  app.use(
    pinoHttp({
      logger,
      genReqId: (req, res) => {
        const incoming = req.headers["x-request-id"];
        const id = typeof incoming === "string" && /^[\w.-]{1,64}$/.test(incoming) ? incoming : randomUUID();
        res.setHeader("x-request-id", id);
        return id;
      },
      autoLogging: { ignore: (req) => req.url === "/api/health" },
    }),
  );
  app.use(securityHeaders(config.COOKIE_SECURE));
  app.use(express.json({ limit: "2mb" }));
  app.use(cookieParser());
  app.use(createSessionMiddleware(dataSource, { secret: deps.sessionSecret, ttlHours: config.SESSION_TTL_HOURS, secureCookies: config.COOKIE_SECURE }));
  const passport = createPassport(dataSource);
  app.use(passport.initialize());
  app.use(passport.session());

  const csrf = createCsrf(deps.sessionSecret, config.COOKIE_SECURE);
  // Sign-in is exempt: it only accepts JSON (no cross-site form can send it) and the session
  // it creates gets a fresh id; every other state-changing request needs the token.
  app.use("/api", (req, res, next) => (req.path === "/auth/login" ? next() : csrf.doubleCsrfProtection(req, res, next)));

  const users = services.users;
  app.use("/api/health", createHealthRouter(routes));
  app.use(
    "/api/auth",
    createAuthRouter(
      { dataSource, passport, users, generateCsrfToken: csrf.generateCsrfToken, loginLimit: config.LOGIN_RATE_LIMIT, loginWindowMinutes: config.LOGIN_RATE_WINDOW_MINUTES },
      routes,
    ),
  );
  app.use("/api/users", createUsersRouter(users, routes));
  app.use("/api/audit", createAuditRouter(dataSource, routes));
  app.use(
    "/api/grids",
    createGridsRouter({ dataSource, dataDir: config.dataDir, ingest: services.ingest, grids: services.grids, uploadMaxBytes: config.GRID_UPLOAD_MAX_MB * 1024 * 1024 }, routes),
  );
  app.use("/api/events", createEventsRouter(services.events, routes));
  app.use("/api/soundings", createSoundingsRouter(routes));
  app.use("/api/zones", createZonesRouter(services.zones, routes));
  app.use("/api/rules", createRulesRouter(services.rules, services.ruleMaps, routes));
  app.use("/api/triggers", createTriggersRouter(services.triggers, services.ruleMaps, routes));
  app.use("/api/timeline", createTimelineRouter(services.triggers, routes));
  for (const [prefix, router] of createNotificationRouters({ notify: services.notify, config, dataSource }, routes)) app.use(prefix, router);
  app.use("/api/history", createHistoryRouter(services.history, routes));
  app.use("/api/storm-reports", createStormReportsRouter(services.stormReports, routes));
  app.use("/api/verification", createVerificationRouter(services.verification, routes));
  app.use("/api", apiNotFound);

  if (deps.clientDir && fs.existsSync(path.join(deps.clientDir, "index.html"))) {
    const clientDir = deps.clientDir;
    app.use(express.static(clientDir, { index: false, maxAge: "1h" }));
    app.get("/{*splat}", (_req, res) => res.sendFile(path.join(clientDir, "index.html")));
  }

  app.use(errorHandler);
  return { app, routes };
}
