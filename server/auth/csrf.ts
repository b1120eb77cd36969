import { doubleCsrf } from "csrf-csrf";
import type { Request } from "express";

/**
 * Double-submit CSRF protection bound to the session id. On plain HTTP the cookie cannot carry
 * the `__Host-` prefix or the Secure flag, so both follow the COOKIE_SECURE setting.
 */
export function createCsrf(secret: string, secureCookies: boolean) {
  return doubleCsrf({
    getSecret: () => secret,
    getSessionIdentifier: (req: Request) => req.sessionID ?? "",
    cookieName: secureCookies ? "__Host-bellwether.csrf" : "bellwether.csrf",
    cookieOptions: { sameSite: "lax", secure: secureCookies, path: "/", httpOnly: true },
    getCsrfTokenFromRequest: (req: Request) => req.get("x-csrf-token"),
    errorConfig: { statusCode: 403, code: "CSRF_INVALID", message: "Missing or stale CSRF token: fetch GET /api/auth/csrf and send it as x-csrf-token." },
  });
}
