import "reflect-metadata";
import { COMMANDS } from "./commands/index.ts";
import { CliUsageError } from "./command.ts";

/** `npm run cli -- <command> [args]`: dispatches to one command file per command. */
async function main(argv: string[]): Promise<number> {
  const [name, ...args] = argv;
  const command = COMMANDS.find((c) => c.name === name);
  if (!command) {
    const list = COMMANDS.map((c) => `  ${c.usage.padEnd(58)} ${c.summary}`).join("\n");
    const out = `Usage: npm run cli -- <command> [args]\n\nCommands:\n${list}\n`;
    if (!name || name === "help" || name === "--help") {
      process.stdout.write(out);
      return 0;
    }
    process.stderr.write(`Unknown command "${name}".\n${out}`);
    return 1;
  }
  return command.run(args);
}

main(process.argv.slice(2)).then(
  (code) => process.exit(code),
  (err: unknown) => {
    process.stderr.write(`${err instanceof Error ? err.message : String(err)}\n`);
    if (!(err instanceof CliUsageError) && process.env.BELLWETHER_DEBUG) console.error(err);
    process.exit(1);
  },
);
