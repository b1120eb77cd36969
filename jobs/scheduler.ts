import cron, { type ScheduledTask } from "node-cron";
import type { Logger } from "pino";
import type { DataSource } from "typeorm";
import { verifyAuditChain, appendAudit, SYSTEM_ACTOR } from "../server/audit/audit-log.ts";
import { writeTransaction } from "../server/db/data-source.ts";
import type { Services } from "../server/services/container.ts";
import path from "node:path";
import { InboxPoller } from "./ingest/poll-inbox.job.ts";
import { pruneOldRuns } from "./maintenance/prune-grids.job.ts";

export interface JobContext {
  dataSource: DataSource;
  logger: Logger;
  services: Services;
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
  const { config } = ctx.services;
  const inbox = new InboxPoller(config.inboxDir, path.join(config.dataDir, "incoming"), ctx.services.ingest, ctx.logger);
  const report = (name: string) => (err: unknown) => ctx.logger.error({ err }, `${name} failed`);
  const tasks: ScheduledTask[] = [
    cron.schedule(`*/${config.INBOX_POLL_SECONDS} * * * * *`, () => void inbox.poll().catch(report("inbox poll")), { timezone: "UTC", name: "inbox-poll" }),
    // A safety net after restarts: frames whose evaluation by a current rule version is missing.
    cron.schedule("*/10 * * * *", () => void ctx.services.evaluation.recheckRecent(24).catch(report("rule re-check")), { timezone: "UTC", name: "rule-recheck" }),
    cron.schedule("*/5 * * * *", () => void ctx.services.triggers.expireOld().catch(report("trigger expiry")), { timezone: "UTC", name: "trigger-expiry" }),
    cron.schedule("*/30 * * * * *", () => void ctx.services.notify.escalation.escalateOverdue().catch(report("escalation")), { timezone: "UTC", name: "escalation" }),
    cron.schedule("20 * * * * *", () => void ctx.services.notify.digests.releaseDue().catch(report("quiet-hours digests")), { timezone: "UTC", name: "quiet-hours-digests" }),
    cron.schedule("5 * * * *", () => void pruneOldRuns(ctx.dataSource, config.dataDir, config.GRID_RETENTION_DAYS, new Date()).catch(report("grid retention")), {
      timezone: "UTC",
      name: "grid-retention",
    }),
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
