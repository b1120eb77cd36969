import fs from "node:fs";
import path from "node:path";
import { spawnSync } from "node:child_process";
import { fileURLToPath } from "node:url";
import { CLIENT_DIR, runUntilSignalled } from "./main.ts";

/**
 * `npm start`: builds the client when the build is missing or older than its sources, then
 * serves (migrations and the demo seed run inside startBellwether).
 */
const root = fileURLToPath(new URL("..", import.meta.url));

function newestMtime(dir: string): number {
  let newest = 0;
  for (const entry of fs.readdirSync(dir, { withFileTypes: true, recursive: true })) {
    if (!entry.isFile()) continue;
    newest = Math.max(newest, fs.statSync(path.join(entry.parentPath, entry.name)).mtimeMs);
  }
  return newest;
}

function clientBuildIsStale(): boolean {
  const index = path.join(CLIENT_DIR, "index.html");
  if (!fs.existsSync(index)) return true;
  const built = fs.statSync(index).mtimeMs;
  return ["src", "shared", "fonts"].some((d) => fs.existsSync(path.join(root, d)) && newestMtime(path.join(root, d)) > built);
}

if (clientBuildIsStale()) {
  console.log("Building the web client (first start or sources changed)…");
  const result = spawnSync(process.execPath, [path.join(root, "node_modules/vite/bin/vite.js"), "build"], { cwd: root, stdio: "inherit" });
  if (result.status !== 0) process.exit(result.status ?? 1);
}

runUntilSignalled().catch((err) => {
  console.error(err instanceof Error ? err.message : err);
  process.exit(1);
});
