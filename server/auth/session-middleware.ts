import session from "express-session";
import { TypeormStore } from "connect-typeorm";
import type { DataSource } from "typeorm";
import type { RequestHandler } from "express";
import { SessionEntity } from "../entities/session.entity.ts";

export interface SessionSettings {
  secret: string;
  ttlHours: number;
  secureCookies: boolean;
}

export const SESSION_COOKIE = "bellwether.sid";

/** Sessions kept in SQLite, with httpOnly, SameSite=Lax cookies (Secure behind HTTPS). */
export function createSessionMiddleware(dataSource: DataSource, settings: SessionSettings): RequestHandler {
  const ttlSeconds = Math.round(settings.ttlHours * 3600);
  const store = new TypeormStore({ cleanupLimit: 2, ttl: ttlSeconds }).connect(dataSource.getRepository(SessionEntity));
  return session({
    name: SESSION_COOKIE,
    secret: settings.secret,
    store,
    resave: false,
    saveUninitialized: false,
    rolling: true,
    cookie: {
      httpOnly: true,
      sameSite: "lax",
      secure: settings.secureCookies,
      maxAge: ttlSeconds * 1000,
    },
  });
}
