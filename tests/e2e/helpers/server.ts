import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { startBellwether, CLIENT_DIR, type RunningBellwether } from "../../../server/main.ts";

export const E2E_PASSWORD = "e2e-demo-password";

/** The real server on a random port with a fresh data folder and the demo seed. */
export async function startE2eServer(env: Record<string, string> = {}): Promise<RunningBellwether & { dataDir: string }> {
  if (!fs.existsSync(path.join(CLIENT_DIR, "index.html"))) {
    throw new Error("The client is not built: run `npm run test:e2e` (it builds first) or `npx vite build`.");
  }
  const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), "bellwether-e2e-"));
  const running = await startBellwether({ DATA_DIR: dataDir, PORT: "0", DEMO_PASSWORD: E2E_PASSWORD, LOG_LEVEL: "warn", JOBS: "false", ...env });
  return {
    ...running,
    dataDir,
    async close() {
      await running.close();
      fs.rmSync(dataDir, { recursive: true, force: true });
    },
  };
}

/** Hands a grid file to the running server's ingest as if it had landed in the inbox (the file is moved). */
export function submitFromInbox(running: RunningBellwether, file: string) {
  return running.services.ingest.submitFile(file, { originalName: path.basename(file), source: "inbox", submittedBy: null });
}
