import fs from "node:fs";
import path from "node:path";
import { createHash } from "node:crypto";
import PQueue from "p-queue";
import type { DataSource } from "typeorm";
import type { Logger } from "pino";
import { In } from "typeorm";
import { IngestJobEntity, type IngestSource, type IngestState } from "../entities/ingest-job.entity.ts";
import { writeTransaction } from "../db/data-source.ts";
import type { EventBus } from "../realtime/event-bus.ts";
import { describeUnknownFormat, detectGridFormat } from "./detect-format.ts";
import type { FrameProcessor } from "./frame-processor.ts";
import { ingestFailureReason } from "./failure-reason.ts";

export interface SubmitOptions {
  originalName: string;
  source: IngestSource;
  submittedBy: string | null;
}

export interface SubmitResult {
  job: IngestJobEntity;
  /** True when a file with the same SHA-256 was already received: nothing new is queued. */
  duplicate: boolean;
}

const UNFINISHED: IngestState[] = ["queued", "decoding", "diagnosing"];

/** Reads the first bytes of a file (format detection never trusts the name). */
function readHead(file: string, length = 16): Uint8Array {
  const fd = fs.openSync(file, "r");
  try {
    const head = Buffer.alloc(length);
    const read = fs.readSync(fd, head, 0, length, 0);
    return head.subarray(0, read);
  } finally {
    fs.closeSync(fd);
  }
}

function sha256OfFile(file: string): Promise<string> {
  return new Promise((resolve, reject) => {
    const hash = createHash("sha256");
    fs.createReadStream(file)
      .on("data", (chunk) => hash.update(chunk))
      .on("error", reject)
      .on("end", () => resolve(hash.digest("hex")));
  });
}

/**
 * Receives grid files and runs each through its durable IngestJob row. Jobs run one at a time
 * (the diagnostics inside a job use every core); rows left unfinished by a crash resume at start-up.
 */
export class IngestService {
  private readonly queue = new PQueue({ concurrency: 1 });
  private readonly filesDir: string;

  constructor(
    private readonly deps: { dataSource: DataSource; dataDir: string; events: EventBus; logger: Logger; processor: FrameProcessor; now?: () => Date },
  ) {
    this.filesDir = path.join(deps.dataDir, "files");
  }

  private now(): string {
    return (this.deps.now?.() ?? new Date()).toISOString();
  }

  /**
   * Takes ownership of `tempFile` (moved into the data folder or deleted). A file that is not
   * GRIB2 or NetCDF becomes a failed job with the reason, so the inbox's history shows it.
   */
  async submitFile(tempFile: string, options: SubmitOptions): Promise<SubmitResult> {
    const sha256 = await sha256OfFile(tempFile);
    const repo = this.deps.dataSource.getRepository(IngestJobEntity);
    const existing = await repo.findOne({ where: { sha256 } });
    if (existing) {
      fs.rmSync(tempFile, { force: true });
      return { job: existing, duplicate: true };
    }
    const head = readHead(tempFile);
    const format = detectGridFormat(head);
    const sizeBytes = fs.statSync(tempFile).size;
    fs.mkdirSync(this.filesDir, { recursive: true });
    const storedPath = path.join("files", `${sha256}.${format === "grib2" ? "grib2" : format === "netcdf" ? "nc" : "bin"}`);
    fs.renameSync(tempFile, path.join(this.deps.dataDir, storedPath));
    const job = await writeTransaction(this.deps.dataSource, (m) =>
      m.getRepository(IngestJobEntity).save(
        m.getRepository(IngestJobEntity).create({
          sha256,
          source: options.source,
          originalName: options.originalName.slice(0, 255),
          storedPath,
          sizeBytes,
          format: format ?? "unknown",
          state: format ? "queued" : "failed",
          progress: 0,
          stageNote: null,
          failureReason: format ? null : describeUnknownFormat(head),
          ignoredFields: null,
          submittedBy: options.submittedBy,
          createdAt: this.now(),
          startedAt: null,
          finishedAt: format ? null : this.now(),
          frameCount: 0,
        }),
      ),
    );
    if (format) this.enqueue(job.id);
    else this.deps.events.emit("ingest.finished", { jobId: job.id, state: "failed", reason: job.failureReason, frameIds: [] });
    return { job, duplicate: false };
  }

  /** Re-queues every job a crash or restart left unfinished, oldest first. */
  async resumeUnfinished(): Promise<number> {
    const jobs = await this.deps.dataSource.getRepository(IngestJobEntity).find({ where: { state: In(UNFINISHED) }, order: { id: "ASC" } });
    for (const job of jobs) this.enqueue(job.id);
    return jobs.length;
  }

  enqueue(jobId: number): void {
    void this.queue.add(() => this.run(jobId));
  }

  /** Resolves when no job is queued or running (tests, shutdown). */
  idle(): Promise<void> {
    return this.queue.onIdle();
  }

  /** Stops taking new jobs; the running one finishes. */
  async stop(): Promise<void> {
    this.queue.clear();
    await this.queue.onIdle();
  }

  private async update(jobId: number, patch: Partial<IngestJobEntity>): Promise<void> {
    await writeTransaction(this.deps.dataSource, (m) => m.getRepository(IngestJobEntity).update({ id: jobId }, patch));
  }

  private async run(jobId: number): Promise<void> {
    const job = await this.deps.dataSource.getRepository(IngestJobEntity).findOne({ where: { id: jobId } });
    if (!job || !UNFINISHED.includes(job.state)) return;
    let lastEmit = 0;
    const progress = async (state: IngestState, fraction: number, note: string | null) => {
      const now = Date.now();
      // Persist and announce stage changes always, fine-grained progress at most ~4 times a second.
      if (state !== job.state || now - lastEmit > 250 || fraction >= 1) {
        lastEmit = now;
        job.state = state;
        await this.update(jobId, { state, progress: fraction, stageNote: note });
        this.deps.events.emit("ingest.progress", { jobId, state, progress: fraction, note });
      }
    };
    try {
      await this.update(jobId, { startedAt: this.now(), failureReason: null });
      const result = await this.deps.processor.process(job, path.join(this.deps.dataDir, job.storedPath), progress);
      await this.update(jobId, {
        state: "ready",
        progress: 1,
        stageNote: `${result.frameIds.length} frame(s) ready`,
        finishedAt: this.now(),
        frameCount: result.frameIds.length,
        ignoredFields: result.ignored.length > 0 ? JSON.stringify(result.ignored) : null,
      });
      this.deps.events.emit("ingest.finished", { jobId, state: "ready", reason: null, frameIds: result.frameIds });
    } catch (error) {
      const reason = ingestFailureReason(error);
      this.deps.logger.warn({ jobId, reason, err: error }, "ingest job failed");
      await this.update(jobId, { state: "failed", failureReason: reason, stageNote: null, finishedAt: this.now() });
      this.deps.events.emit("ingest.finished", { jobId, state: "failed", reason, frameIds: [] });
    }
  }
}
