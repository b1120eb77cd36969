import type { NextFunction, Request, RequestHandler, Response, Router } from "express";
import { can, type Permission } from "../../shared/auth/permissions.ts";
import { currentUser } from "../auth/current-user.ts";
import { ForbiddenError, UnauthenticatedError } from "../errors.ts";

/** Who may call a route: anyone, any signed-in user, or the holders of one permission. */
export type Access = "public" | "signed-in" | Permission;
export type HttpMethod = "get" | "post" | "put" | "patch" | "delete";

export interface RouteEntry {
  method: HttpMethod;
  path: string;
  access: Access;
}

/** The guard every route passes through: 401 without a session, 403 without the permission. */
export function requireAccess(access: Access): RequestHandler {
  return (req: Request, _res: Response, next: NextFunction) => {
    if (access === "public") return next();
    const user = currentUser(req);
    if (!user) return next(new UnauthenticatedError());
    if (access !== "signed-in" && !can(user.roles, access)) return next(new ForbiddenError());
    next();
  };
}

type Register = (path: string, access: Access, ...handlers: RequestHandler[]) => void;

/**
 * Registers routes on a router with their access rule, and records each one in `table` so the
 * role-matrix test can walk every route that exists.
 */
export function securedRoutes(router: Router, prefix: string, table: RouteEntry[]): Record<HttpMethod, Register> {
  const register =
    (method: HttpMethod): Register =>
    (path, access, ...handlers) => {
      table.push({ method, path: prefix + path, access });
      router[method](path, requireAccess(access), ...handlers);
    };
  return { get: register("get"), post: register("post"), put: register("put"), patch: register("patch"), delete: register("delete") };
}
