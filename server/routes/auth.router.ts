import { Router, type Request, type Response, type NextFunction, type RequestHandler } from "express";
import { rateLimit, ipKeyGenerator } from "express-rate-limit";
import type { PassportStatic } from "passport";
import { loginInput } from "../../shared/api/auth.ts";
import { parseInput } from "../http/validate.ts";
import { securedRoutes, type RouteEntry } from "../http/route-table.ts";
import { actorOf, currentUser, type SessionUser } from "../auth/current-user.ts";
import { AppError, UnauthenticatedError } from "../errors.ts";
import type { UserService } from "../services/user.service.ts";
import { toUserDto } from "../services/user.service.ts";
import { UserEntity } from "../entities/user.entity.ts";
import type { DataSource } from "typeorm";
import { appendAudit } from "../audit/audit-log.ts";
import { writeTransaction } from "../db/data-source.ts";
import { SESSION_COOKIE } from "../auth/session-middleware.ts";
import type { LoginFailure } from "../auth/passport-setup.ts";

export interface AuthRouterDeps {
  dataSource: DataSource;
  passport: PassportStatic;
  users: UserService;
  generateCsrfToken: (req: Request, res: Response) => string;
  loginLimit: number;
  loginWindowMinutes: number;
}

const FAILURE_MESSAGES: Record<LoginFailure, AppError> = {
  BAD_CREDENTIALS: new AppError(401, "BAD_CREDENTIALS", "Username or password not recognised."),
  ACCOUNT_DISABLED: new AppError(403, "ACCOUNT_DISABLED", "This account is disabled. Ask an administrator."),
};

function authenticate(passport: PassportStatic, req: Request, res: Response, next: NextFunction): Promise<{ user: SessionUser | false; failure?: LoginFailure }> {
  return new Promise((resolve, reject) => {
    const handler = passport.authenticate("local", (err: unknown, user: SessionUser | false, info?: { message?: string }) => {
      if (err) return reject(err);
      resolve({ user, failure: (info?.message as LoginFailure | undefined) ?? "BAD_CREDENTIALS" });
    }) as RequestHandler;
    handler(req, res, next);
  });
}

export function createAuthRouter(deps: AuthRouterDeps, table: RouteEntry[]): Router {
  const router = Router();
  const routes = securedRoutes(router, "/api/auth", table);

  const loginLimiter = rateLimit({
    windowMs: deps.loginWindowMinutes * 60_000,
    limit: deps.loginLimit,
    standardHeaders: "draft-8",
    legacyHeaders: false,
    // Per address and username, so one office behind one NAT address does not lock everyone out.
    keyGenerator: (req) => `${ipKeyGenerator(req.ip ?? "unknown")}|${String(req.body?.username ?? "").toLowerCase()}`,
    handler: (req, _res, next) =>
      next(new AppError(429, "TOO_MANY_ATTEMPTS", `Too many sign-in attempts. Wait ${deps.loginWindowMinutes} minutes and try again.`)),
  });

  routes.get("/csrf", "public", (req, res) => {
    // Touch the session first so its id (which the token is bound to) stays stable.
    (req.session as unknown as { csrfIssuedAt?: number }).csrfIssuedAt = Date.now();
    res.json({ token: deps.generateCsrfToken(req, res) });
  });

  routes.post("/login", "public", loginLimiter, async (req, res, next) => {
    if (!req.is("application/json")) throw new AppError(415, "UNSUPPORTED_MEDIA_TYPE", "Send the sign-in as JSON: {\"username\", \"password\"}.");
    req.body = parseInput(loginInput, req.body, "body");
    const { user, failure } = await authenticate(deps.passport, req, res, next);
    if (!user) {
      await writeTransaction(deps.dataSource, (m) =>
        appendAudit(m, { ...actorOf(req), username: null }, { action: "auth.sign_in_refused", targetType: "user", targetId: null, after: { username: req.body.username, reason: failure } }),
      );
      throw FAILURE_MESSAGES[failure ?? "BAD_CREDENTIALS"];
    }
    // passport 0.7 regenerates the session id inside logIn (defeats session fixation).
    await new Promise<void>((resolve, reject) => req.logIn(user, (err) => (err ? reject(err) : resolve())));
    await deps.users.recordSignIn({ ...actorOf(req), username: user.username, roles: user.roles }, user.id);
    const entity = await deps.dataSource.getRepository(UserEntity).findOneByOrFail({ id: user.id });
    res.json({ user: toUserDto(entity) });
  });

  routes.post("/logout", "signed-in", async (req, res) => {
    const actor = actorOf(req);
    await new Promise<void>((resolve, reject) => req.logout((err) => (err ? reject(err) : resolve())));
    await new Promise<void>((resolve) => req.session.destroy(() => resolve()));
    await writeTransaction(deps.dataSource, (m) => appendAudit(m, actor, { action: "auth.signed_out", targetType: "user", targetId: null }));
    res.clearCookie(SESSION_COOKIE);
    res.status(204).end();
  });

  routes.get("/me", "signed-in", async (req, res) => {
    const user = currentUser(req);
    if (!user) throw new UnauthenticatedError();
    const entity = await deps.dataSource.getRepository(UserEntity).findOneByOrFail({ id: user.id });
    res.json({ user: toUserDto(entity) });
  });

  return router;
}
