import fs from "node:fs";
import path from "node:path";
import { randomUUID } from "node:crypto";
import type { Logger } from "pino";
import type { IngestService } from "../../server/ingest/ingest.service.ts";

/**
 * Watches the inbox folder. A file is taken only once its size has stayed the same between two
 * polls (so a file still being copied in is left alone); it is moved out of the inbox at once and
 * handed to the ingest service, which records it as a durable job.
 */
export class InboxPoller {
  private readonly lastSizes = new Map<string, number>();
  private polling = false;

  constructor(
    private readonly inboxDir: string,
    private readonly incomingDir: string,
    private readonly ingest: IngestService,
    private readonly logger: Logger,
  ) {
    fs.mkdirSync(inboxDir, { recursive: true });
    fs.mkdirSync(incomingDir, { recursive: true });
  }

  /** One pass over the inbox; returns how many files were taken. Overlapping calls do nothing. */
  async poll(): Promise<number> {
    if (this.polling) return 0;
    this.polling = true;
    try {
      let taken = 0;
      const seen = new Set<string>();
      for (const entry of fs.readdirSync(this.inboxDir, { withFileTypes: true })) {
        if (!entry.isFile() || entry.name.startsWith(".") || /\.(tmp|part|partial)$/i.test(entry.name)) continue;
        seen.add(entry.name);
        const file = path.join(this.inboxDir, entry.name);
        const size = fs.statSync(file).size;
        const previous = this.lastSizes.get(entry.name);
        this.lastSizes.set(entry.name, size);
        if (previous !== size || size === 0) continue;
        await this.take(file, entry.name);
        this.lastSizes.delete(entry.name);
        taken++;
      }
      for (const name of [...this.lastSizes.keys()]) if (!seen.has(name)) this.lastSizes.delete(name);
      return taken;
    } finally {
      this.polling = false;
    }
  }

  private async take(file: string, name: string): Promise<void> {
    const claimed = path.join(this.incomingDir, `inbox-${randomUUID()}`);
    try {
      fs.renameSync(file, claimed);
    } catch (error) {
      // Inbox on another file system: copy, then remove the original.
      if ((error as NodeJS.ErrnoException).code !== "EXDEV") throw error;
      fs.copyFileSync(file, claimed);
      fs.rmSync(file);
    }
    const { job, duplicate } = await this.ingest.submitFile(claimed, { originalName: name, source: "inbox", submittedBy: null });
    this.logger.info({ file: name, jobId: job.id, duplicate }, duplicate ? "inbox file already received" : "inbox file queued");
  }
}
