/**
 * Benchmark runner: `npm run bench -- <name>` runs tests/bench/<name>.bench.ts; `npm run bench` runs them all.
 * Each bench module exports `async function run(): Promise<void>` and prints its own figures.
 */
import fs from "node:fs";
import path from "node:path";
import { pathToFileURL } from "node:url";

const folder = import.meta.dirname;
const SUFFIX = ".bench.ts";

async function main(names: string[]): Promise<number> {
  const available = fs.readdirSync(folder).filter((f) => f.endsWith(SUFFIX)).map((f) => f.slice(0, -SUFFIX.length)).sort();
  const chosen = names.length > 0 ? names : available;
  for (const name of chosen) {
    if (!available.includes(name)) {
      process.stderr.write(`Unknown bench "${name}". Available: ${available.join(", ") || "none"}\n`);
      return 1;
    }
  }
  for (const name of chosen) {
    const module = (await import(pathToFileURL(path.join(folder, name + SUFFIX)).href)) as { run?: () => Promise<void> };
    if (typeof module.run !== "function") {
      process.stderr.write(`${name}${SUFFIX} does not export run()\n`);
      return 1;
    }
    process.stdout.write(`== ${name} ==\n`);
    await module.run();
  }
  return 0;
}

main(process.argv.slice(2)).then((code) => process.exit(code), (err: unknown) => {
  process.stderr.write(`${err instanceof Error ? err.stack ?? err.message : String(err)}\n`);
  process.exit(1);
});
