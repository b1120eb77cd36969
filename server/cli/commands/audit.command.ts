import { loadConfig } from "../../config.ts";
import { openDatabase } from "../../db/data-source.ts";
import { verifyAuditChain } from "../../audit/audit-log.ts";
import { CliUsageError, parseCliArgs, type CliCommand } from "../command.ts";
import fs from "node:fs";

/** `audit verify [--json]`: walks the hash chain of the database in DATA_DIR. Exit 0 intact, 2 broken. */
export const auditCommand: CliCommand = {
  name: "audit",
  summary: "Verify the audit trail's hash chain (audit verify [--json])",
  usage: "audit verify [--json]",
  async run(args) {
    const { positional, flags } = parseCliArgs(args);
    if (positional[0] !== "verify") throw new CliUsageError(`Usage: npm run cli -- ${this.usage}`);
    const config = loadConfig();
    if (!fs.existsSync(config.databaseFile)) throw new CliUsageError(`No database at ${config.databaseFile} (set DATA_DIR).`);
    const dataSource = await openDatabase({ database: config.databaseFile });
    try {
      const result = await verifyAuditChain(dataSource);
      if (flags.has("json")) console.log(JSON.stringify(result));
      else if (result.ok) console.log(`Audit chain intact: ${result.checked} entries checked.`);
      else console.log(`Audit chain BROKEN at entry #${result.firstBroken} (${result.checked} entries before it are intact).`);
      return result.ok ? 0 : 2;
    } finally {
      await dataSource.destroy();
    }
  },
};
