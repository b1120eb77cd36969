import cron, { type ScheduledTask } from "node-cron";
import type { Logger } from "pino";
import type { DataSource } from "typeorm";
import { verifyAuditChain, appendAudit, SYSTEM_ACTOR } from "../server/audit/audit-log.ts";
import { writeTransaction } from "../server/db/data-source.ts";

export interface JobContext {
  dataSource: DataSource;
  logger: Logger;
}

export interface Scheduler {
  stop(): Promise<void>;
}

/** Checks the audit hash chain and records the outcome in the trail itself. */
export async function runAuditVerification(ctx: JobContext): Promise<void> {
  const result = await verifyAuditChain(ctx.dataSource);
  if (!result.ok) ctx.logger.error({ result }, "audit chain broken");
  await writeTransaction(ctx.dataSource, (m) =>
    appendAudit(m, SYSTEM_ACTOR, { action: result.ok ? "audit.verified" : "audit.verify_failed", targetType: "audit", targetId: null, after: result }),
  );
}

/** Starts every scheduled job. Each cron line only starts work; the work lives in its own function. */
export function startScheduler(ctx: JobContext): Scheduler {
  const tasks: ScheduledTask[] = [
    cron.schedule("17 3 * * *", () => void runAuditVerification(ctx).catch((err) => ctx.logger.error({ err }, "audit verification failed")), {
      timezone: "UTC",
      name: "audit-verify",
    }),
  ];
  return {
    async stop() {
      await Promise.all(tasks.map((t) => t.stop()));
    },
  };
}
