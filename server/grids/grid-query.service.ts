import path from "node:path";
import fs from "node:fs";
import type { DataSource } from "typeorm";
import { In } from "typeorm";
import type { GridGeometry } from "../../shared/grid/geometry-types.ts";
import { nearestGridPoint, gridCoordinates } from "../../shared/grid/grid-coordinates.ts";
import type { ColumnProfile } from "../../shared/meteo/column/column-profile.ts";
import { buildSoundingReport, type SoundingReport } from "../../shared/meteo/sounding-report.ts";
import type { FrameDetailDto, FrameSummaryDto, IngestJobDto, RunDto } from "../../shared/api/grids.ts";
import { IngestJobEntity, type IngestState } from "../entities/ingest-job.entity.ts";
import { ModelRunEntity } from "../entities/model-run.entity.ts";
import { GridFrameEntity } from "../entities/grid-frame.entity.ts";
import { FieldInfoEntity } from "../entities/field-info.entity.ts";
import { NotFoundError, ValidationError } from "../errors.ts";
import { readFieldFile, readStrided } from "./field-file.ts";

export function toIngestJobDto(job: IngestJobEntity): IngestJobDto {
  return {
    id: job.id,
    source: job.source,
    originalName: job.originalName,
    sizeBytes: job.sizeBytes,
    format: job.format,
    sha256: job.sha256,
    state: job.state,
    progress: job.progress,
    stageNote: job.stageNote,
    failureReason: job.failureReason,
    ignoredFields: job.ignoredFields ? (JSON.parse(job.ignoredFields) as string[]) : [],
    submittedBy: job.submittedBy,
    createdAt: job.createdAt,
    startedAt: job.startedAt,
    finishedAt: job.finishedAt,
    frameCount: job.frameCount,
  };
}

const toFrameSummary = (f: GridFrameEntity): FrameSummaryDto => ({
  id: f.id,
  runId: f.runId,
  model: f.model,
  runTime: f.runTime,
  validTime: f.validTime,
  forecastHour: f.forecastHour,
  ingestJobId: f.ingestJobId,
});

export interface ColumnAtPoint {
  frame: FrameSummaryDto;
  point: { i: number; j: number; lat: number; lon: number };
  report: SoundingReport;
}

/** Read-side queries over ingest jobs, runs, frames and stored fields. */
export class GridQueryService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly dataDir: string,
  ) {}

  async listJobs(limit: number, state?: IngestState): Promise<IngestJobDto[]> {
    const jobs = await this.dataSource.getRepository(IngestJobEntity).find({ where: state ? { state } : {}, order: { id: "DESC" }, take: limit });
    return jobs.map(toIngestJobDto);
  }

  async getJob(id: number): Promise<IngestJobDto> {
    const job = await this.dataSource.getRepository(IngestJobEntity).findOne({ where: { id } });
    if (!job) throw new NotFoundError(`Ingest job ${id}`);
    return toIngestJobDto(job);
  }

  /** Newest runs first, each with its frames in valid-time order. */
  async listRuns(limit: number): Promise<RunDto[]> {
    const runs = await this.dataSource.getRepository(ModelRunEntity).find({ order: { runTime: "DESC", id: "DESC" }, take: limit });
    if (runs.length === 0) return [];
    const frames = await this.dataSource.getRepository(GridFrameEntity).find({ where: { runId: In(runs.map((r) => r.id)) }, order: { validTime: "ASC" } });
    return runs.map((r) => ({ id: r.id, model: r.model, runTime: r.runTime, frames: frames.filter((f) => f.runId === r.id).map(toFrameSummary) }));
  }

  async getFrameEntity(id: number): Promise<GridFrameEntity> {
    const frame = await this.dataSource.getRepository(GridFrameEntity).findOne({ where: { id } });
    if (!frame) throw new NotFoundError(`Frame ${id}`);
    return frame;
  }

  async getFrame(id: number): Promise<FrameDetailDto> {
    const frame = await this.getFrameEntity(id);
    const fields = await this.dataSource.getRepository(FieldInfoEntity).find({ where: { frameId: id }, order: { key: "ASC" } });
    return {
      ...toFrameSummary(frame),
      geometry: JSON.parse(frame.geometry) as Record<string, unknown>,
      levels: JSON.parse(frame.levels) as number[],
      fields: fields.map((f) => ({ key: f.key, unit: f.unit, min: f.min, max: f.max, nanCount: f.nanCount })),
    };
  }

  /** A stored 2-D field's values in canonical order. */
  async readField(frameId: number, key: string): Promise<{ frame: GridFrameEntity; geometry: GridGeometry; values: Float32Array }> {
    const frame = await this.getFrameEntity(frameId);
    const info = await this.dataSource.getRepository(FieldInfoEntity).findOne({ where: { frameId, key } });
    if (!info) throw new NotFoundError(`Field "${key}" of frame ${frameId}`);
    const geometry = JSON.parse(frame.geometry) as GridGeometry;
    const values = readFieldFile(path.join(this.dataDir, frame.folder, info.file), geometry.nx * geometry.ny);
    return { frame, geometry, values };
  }

  /** The jet-streak document stored with a frame (empty when the frame predates jet diagnostics). */
  async jetStreaks(frameId: number): Promise<{ jetLevelPressure: number | null; streaks: unknown[]; warnings: string[] }> {
    const frame = await this.getFrameEntity(frameId);
    const file = path.join(this.dataDir, frame.folder, "jet-streaks.json");
    if (!fs.existsSync(file)) return { jetLevelPressure: null, streaks: [], warnings: ["This frame was stored before jet-streak diagnostics."] };
    return JSON.parse(fs.readFileSync(file, "utf8")) as { jetLevelPressure: number | null; streaks: unknown[]; warnings: string[] };
  }

  /** The model column nearest a point, as a sounding (skew-T, hodograph and every column field). */
  async columnAt(frameId: number, lat: number, lon: number): Promise<ColumnAtPoint> {
    const frame = await this.getFrameEntity(frameId);
    const geometry = JSON.parse(frame.geometry) as GridGeometry;
    const nearest = nearestGridPoint(geometry, lat, lon);
    if (!nearest) throw new ValidationError(`The point ${lat.toFixed(3)}, ${lon.toFixed(3)} lies outside frame ${frameId}'s grid.`);
    const n = geometry.nx * geometry.ny;
    const levels = JSON.parse(frame.levels) as number[];
    const folder = path.join(this.dataDir, frame.folder, "inputs");
    const at = (key: string) => readStrided(path.join(folder, `${key}.f32`), nearest.index, n, 1)[0]!;
    const column = (key: string) => readStrided(path.join(folder, `${key}.f32`), nearest.index, n, levels.length);
    if (!fs.existsSync(path.join(folder, "t.f32"))) throw new NotFoundError(`Model columns of frame ${frameId}`);
    const [t, td, z, u, v] = ["t", "td", "z", "u", "v"].map(column) as [Float32Array, Float32Array, Float32Array, Float32Array, Float32Array];
    const profile = { pressure: [at("p_sfc")], height: [at("z_sfc")], temperature: [at("t_2m")], dewpoint: [at("td_2m")], u: [at("u_10m")], v: [at("v_10m")] };
    for (let k = 0; k < levels.length; k++) {
      const p = levels[k]!;
      const last = profile.pressure.length - 1;
      if (p >= profile.pressure[last]! || !(z[k]! > profile.height[last]!) || !(t[k]! > 0) || !(td[k]! > 0)) continue;
      profile.pressure.push(p);
      profile.height.push(z[k]!);
      profile.temperature.push(t[k]!);
      profile.dewpoint.push(Math.min(td[k]!, t[k]!));
      profile.u.push(u[k]!);
      profile.v.push(v[k]!);
    }
    const coords = gridCoordinates(geometry);
    return {
      frame: toFrameSummary(frame),
      point: { i: nearest.i, j: nearest.j, lat: coords.lat[nearest.index]!, lon: coords.lon[nearest.index]! },
      report: buildSoundingReport(profile as ColumnProfile),
    };
  }
}
