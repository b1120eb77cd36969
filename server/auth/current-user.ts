import type { Request } from "express";
import type { Role } from "../../shared/auth/permissions.ts";
import type { AuditActor } from "../audit/audit-log.ts";

/** What the session keeps about the signed-in user (re-read from the database on every request). */
export interface SessionUser {
  id: number;
  username: string;
  displayName: string;
  roles: Role[];
}

export function currentUser(req: Request): SessionUser | null {
  return (req.user as SessionUser | undefined) ?? null;
}

/** The audit actor for a request: the signed-in user plus the request id. */
export function actorOf(req: Request): AuditActor {
  const user = currentUser(req);
  return {
    username: user?.username ?? null,
    roles: user?.roles ?? [],
    requestId: typeof req.id === "string" ? req.id : req.id !== undefined ? String(req.id) : null,
  };
}
