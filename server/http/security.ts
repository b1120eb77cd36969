import helmet from "helmet";
import type { RequestHandler } from "express";

/** Security headers. Upgrading requests to HTTPS only makes sense when the office serves over HTTPS. */
export function securityHeaders(https: boolean): RequestHandler {
  return helmet({
    contentSecurityPolicy: {
      directives: {
        "default-src": ["'self'"],
        "img-src": ["'self'", "data:", "blob:"],
        "style-src": ["'self'", "'unsafe-inline'"],
        "font-src": ["'self'", "data:"],
        "connect-src": ["'self'"],
        "upgrade-insecure-requests": https ? [] : null,
      },
    },
    strictTransportSecurity: https,
  });
}
