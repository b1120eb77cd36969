import fs from "node:fs";
import path from "node:path";
import { randomBytes } from "node:crypto";

/** The configured secret, or one generated on first run and kept (owner-only) in the data folder. */
export function resolveSessionSecret(dataDir: string, configured: string | undefined): string {
  if (configured) return configured;
  const file = path.join(dataDir, "session-secret");
  if (fs.existsSync(file)) return fs.readFileSync(file, "utf8").trim();
  const secret = randomBytes(48).toString("base64url");
  fs.writeFileSync(file, secret, { mode: 0o600 });
  return secret;
}
