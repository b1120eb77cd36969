import fs from "node:fs";
import path from "node:path";
import type { DataSource } from "typeorm";
import { In, LessThan } from "typeorm";
import { ModelRunEntity } from "../../server/entities/model-run.entity.ts";
import { GridFrameEntity } from "../../server/entities/grid-frame.entity.ts";
import { FieldInfoEntity } from "../../server/entities/field-info.entity.ts";
import { IngestJobEntity } from "../../server/entities/ingest-job.entity.ts";
import { writeTransaction } from "../../server/db/data-source.ts";

export interface PruneResult {
  runs: number;
  frames: number;
  files: number;
}

/**
 * Deletes model runs whose run time is older than the retention period: their frames, field
 * rows and stored fields, and the received files of jobs that produced them. Job rows stay as
 * the ingest history.
 */
export async function pruneOldRuns(dataSource: DataSource, dataDir: string, retentionDays: number, now: Date): Promise<PruneResult> {
  const cutoff = new Date(now.getTime() - retentionDays * 86_400_000).toISOString();
  const { folders, files, result } = await writeTransaction(dataSource, async (m) => {
    const runs = await m.getRepository(ModelRunEntity).find({ where: { runTime: LessThan(cutoff) } });
    if (runs.length === 0) return { folders: [], files: [], result: { runs: 0, frames: 0, files: 0 } };
    const frames = await m.getRepository(GridFrameEntity).find({ where: { runId: In(runs.map((r) => r.id)) } });
    const jobIds = [...new Set(frames.map((f) => f.ingestJobId))];
    const jobs = jobIds.length ? await m.getRepository(IngestJobEntity).find({ where: { id: In(jobIds) } }) : [];
    if (frames.length) await m.getRepository(FieldInfoEntity).delete({ frameId: In(frames.map((f) => f.id)) });
    if (frames.length) await m.getRepository(GridFrameEntity).delete({ id: In(frames.map((f) => f.id)) });
    await m.getRepository(ModelRunEntity).delete({ id: In(runs.map((r) => r.id)) });
    return {
      folders: runs.map((r) => path.join(dataDir, "grids", `run-${r.id}`)),
      files: jobs.map((j) => path.join(dataDir, j.storedPath)),
      result: { runs: runs.length, frames: frames.length, files: jobs.length },
    };
  });
  // Files go only after the rows are gone, so a crash leaves orphan files, never rows without files.
  for (const folder of folders) fs.rmSync(folder, { recursive: true, force: true });
  for (const file of files) fs.rmSync(file, { force: true });
  return result;
}
