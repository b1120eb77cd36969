import fs from "node:fs";
import path from "node:path";
import type { DataSource } from "typeorm";
import { COLUMN_FIELD_KEYS, fieldByKey } from "../../shared/fields.ts";
import { geometryKey } from "../../shared/grid/geometry-key.ts";
import type { IngestJobEntity, IngestState } from "../entities/ingest-job.entity.ts";
import { ModelRunEntity } from "../entities/model-run.entity.ts";
import { GridFrameEntity } from "../entities/grid-frame.entity.ts";
import { FieldInfoEntity } from "../entities/field-info.entity.ts";
import { writeTransaction } from "../db/data-source.ts";
import { fieldStats, writeFieldFile } from "../grids/field-file.ts";
import type { EventBus } from "../realtime/event-bus.ts";
import { assembleFrames, type FrameInput } from "./assemble-frames.ts";
import type { GridRecord } from "./grid-record.ts";
import type { GridFileFormat } from "./detect-format.ts";
import { INPUT_FIELDS_2D, INPUT_FIELDS_3D } from "./stored-inputs.ts";
import type { ColumnGridOutput } from "../../shared/meteo/column/column-grid.ts";

export type ProgressReporter = (state: IngestState, fraction: number, note: string | null) => Promise<void>;

export interface FrameProcessor {
  process(job: IngestJobEntity, file: string, progress: ProgressReporter): Promise<{ frameIds: number[]; ignored: string[] }>;
}

/** Decodes a file of a known format into format-neutral records (SI units, canonical layout). */
export type GridDecoder = (bytes: Uint8Array, format: GridFileFormat) => GridRecord[] | Promise<GridRecord[]>;

/** Runs the column diagnostics over a frame's grid; reports the fraction done. */
export type ColumnDiagnoser = (frame: FrameInput, onProgress: (fraction: number) => void) => Promise<ColumnGridOutput>;

/** Extra derived fields (e.g. the jet diagnostics) by catalogue key, and JSON documents stored beside them. */
export type ExtraDiagnoser = (frame: FrameInput) => Promise<{ fields: Record<string, Float32Array>; documents?: Record<string, unknown> }>;

export interface FrameProcessorDeps {
  dataSource: DataSource;
  dataDir: string;
  events: EventBus;
  decode: GridDecoder;
  diagnoseColumns: ColumnDiagnoser;
  extraDiagnosers?: ExtraDiagnoser[];
  /** Called after a frame is committed (rule evaluation hooks in here). */
  onFrameReady?: (frameId: number) => void;
}

const compactTime = (iso: string) => iso.replace(/[-:]/g, "").replace(/\.\d+Z$/, "Z");

/**
 * decode → assemble → diagnose → store. Every field of a job is written under a private
 * `.partial` folder first; only when all frames are complete are the folders moved into place
 * and the rows committed in one transaction, so a failure leaves no partial frame behind.
 */
export class GridFrameProcessor implements FrameProcessor {
  constructor(private readonly deps: FrameProcessorDeps) {}

  async process(job: IngestJobEntity, file: string, progress: ProgressReporter): Promise<{ frameIds: number[]; ignored: string[] }> {
    const partialRoot = path.join(this.deps.dataDir, "grids", ".partial", `job-${job.id}`);
    fs.rmSync(partialRoot, { recursive: true, force: true });
    try {
      await progress("decoding", 0.02, `Reading ${job.format.toUpperCase()} file`);
      const bytes = new Uint8Array(fs.readFileSync(file));
      const records = await this.deps.decode(bytes, job.format as GridFileFormat);
      await progress("decoding", 0.1, `Decoded ${records.length} field(s); assembling frames`);
      const { frames, ignored } = assembleFrames(records);

      const written: Array<{ frame: FrameInput; folder: string; fields: FieldInfoEntity[] }> = [];
      for (const [index, frame] of frames.entries()) {
        const span = 0.85 / frames.length;
        const base = 0.1 + index * span;
        const label = `frame ${index + 1} of ${frames.length} (valid ${frame.validTime.slice(0, 10)} ${frame.validTime.slice(11, 16)}Z)`;
        await progress("diagnosing", base, `Diagnosing ${label}`);
        let last = 0;
        const columns = await this.deps.diagnoseColumns(frame, (f) => {
          const now = Date.now();
          if (now - last > 250) {
            last = now;
            void progress("diagnosing", base + span * 0.9 * f, `Diagnosing ${label}: ${Math.round(f * 100)} %`);
          }
        });
        const extras: Record<string, Float32Array> = {};
        const folder = path.join(partialRoot, `frame-${index}`);
        for (const extra of this.deps.extraDiagnosers ?? []) {
          const result = await extra(frame);
          Object.assign(extras, result.fields);
          for (const [name, document] of Object.entries(result.documents ?? {})) {
            fs.mkdirSync(folder, { recursive: true });
            fs.writeFileSync(path.join(folder, `${name}.json`), JSON.stringify(document));
          }
        }
        written.push({ frame, folder, fields: this.writeFrameFiles(folder, frame, columns, extras) });
      }
      await progress("diagnosing", 0.97, "Storing frames");
      const committed = await this.commit(job, written);
      for (const f of committed) {
        this.deps.events.emit("frame.ready", { frameId: f.id, runId: f.runId, model: f.model, runTime: f.runTime, validTime: f.validTime });
        this.deps.onFrameReady?.(f.id);
      }
      return { frameIds: committed.map((f) => f.id), ignored };
    } finally {
      fs.rmSync(partialRoot, { recursive: true, force: true });
    }
  }

  private writeFrameFiles(folder: string, frame: FrameInput, columns: ColumnGridOutput, extras: Record<string, Float32Array>): FieldInfoEntity[] {
    const infos: FieldInfoEntity[] = [];
    const store = (key: string, unit: string, values: Float32Array, subfolder: string) => {
      const relative = path.join(subfolder, `${key}.f32`);
      writeFieldFile(path.join(folder, relative), values);
      const stats = fieldStats(values);
      infos.push(Object.assign(new FieldInfoEntity(), { key, unit, min: stats.min, max: stats.max, nanCount: stats.nanCount, file: relative }));
    };
    for (const key of COLUMN_FIELD_KEYS) store(key, fieldByKey(key)!.unit, columns[key], "fields");
    for (const [key, values] of Object.entries(extras)) store(key, fieldByKey(key)?.unit ?? "1", values, "fields");
    for (const input of INPUT_FIELDS_2D) store(input.key, input.unit, input.extract(frame), "inputs");
    // 3-D inputs (for soundings at a map point) are stored without stats rows: level-major files.
    for (const input of INPUT_FIELDS_3D) writeFieldFile(path.join(folder, "inputs", `${input.key}.f32`), input.extract(frame));
    return infos;
  }

  private async commit(job: IngestJobEntity, written: Array<{ frame: FrameInput; folder: string; fields: FieldInfoEntity[] }>): Promise<GridFrameEntity[]> {
    const moved: Array<{ from: string; to: string }> = [];
    const replaced: string[] = [];
    try {
      const ids = await writeTransaction(this.deps.dataSource, async (m) => {
        const ids: GridFrameEntity[] = [];
        const now = new Date().toISOString();
        for (const { frame, folder, fields } of written) {
          const runs = m.getRepository(ModelRunEntity);
          let run = await runs.findOne({ where: { model: frame.model, runTime: frame.runTime } });
          run ??= await runs.save(runs.create({ model: frame.model, runTime: frame.runTime, createdAt: now }));
          // A newer file for the same run and valid time replaces the stored frame.
          const frames = m.getRepository(GridFrameEntity);
          const previous = await frames.findOne({ where: { runId: run.id, validTime: frame.validTime } });
          if (previous) {
            await m.getRepository(FieldInfoEntity).delete({ frameId: previous.id });
            await frames.delete({ id: previous.id });
            replaced.push(path.join(this.deps.dataDir, previous.folder));
          }
          const relativeFolder = path.join("grids", `run-${run.id}`, `${compactTime(frame.validTime)}-job${job.id}`);
          const target = path.join(this.deps.dataDir, relativeFolder);
          fs.rmSync(target, { recursive: true, force: true });
          fs.mkdirSync(path.dirname(target), { recursive: true });
          fs.renameSync(folder, target);
          moved.push({ from: folder, to: target });
          const saved = await frames.save(
            frames.create({
              runId: run.id,
              model: frame.model,
              runTime: frame.runTime,
              validTime: frame.validTime,
              forecastHour: frame.forecastHour,
              ingestJobId: job.id,
              geometry: JSON.stringify(frame.geometry),
              geometryKey: geometryKey(frame.geometry),
              levels: JSON.stringify(frame.levels),
              folder: relativeFolder,
              createdAt: now,
            }),
          );
          await m.getRepository(FieldInfoEntity).save(fields.map((f) => Object.assign(f, { frameId: saved.id })));
          ids.push(saved);
        }
        return ids;
      });
      // Only once the new rows are committed do the replaced frames' files go.
      for (const folder of replaced) fs.rmSync(folder, { recursive: true, force: true });
      return ids;
    } catch (error) {
      // The rows rolled back: take the moved folders away too, so nothing half-stored remains.
      for (const { to } of moved) fs.rmSync(to, { recursive: true, force: true });
      throw error;
    }
  }
}
