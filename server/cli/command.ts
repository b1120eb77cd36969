/** One CLI command: `npm run cli -- <name> ...args`. */
export interface CliCommand {
  name: string;
  /** One line for `npm run cli -- help`. */
  summary: string;
  usage: string;
  /** Returns the process exit code. Prints results to stdout and problems to stderr. */
  run(args: string[]): Promise<number>;
}

/** Thrown for wrong arguments or bad input files: printed to stderr, exit code 1, no stack. */
export class CliUsageError extends Error {}

/** Splits `--flag value` / `--flag=value` / `--switch` options from positional arguments. */
export function parseCliArgs(args: string[], valueFlags: readonly string[] = []): { positional: string[]; flags: Map<string, string | true> } {
  const positional: string[] = [];
  const flags = new Map<string, string | true>();
  for (let i = 0; i < args.length; i++) {
    const arg = args[i]!;
    if (!arg.startsWith("--")) {
      positional.push(arg);
      continue;
    }
    const [name, inline] = arg.slice(2).split("=", 2) as [string, string | undefined];
    if (inline !== undefined) flags.set(name, inline);
    else if (valueFlags.includes(name)) {
      const value = args[++i];
      if (value === undefined) throw new CliUsageError(`--${name} needs a value`);
      flags.set(name, value);
    } else flags.set(name, true);
  }
  return { positional, flags };
}
