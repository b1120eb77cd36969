import "reflect-metadata";
import { Column, Entity, Index, PrimaryGeneratedColumn } from "typeorm";

/** One valid time of one run on one grid: the unit rules are evaluated on. */
@Entity({ name: "grid_frames" })
@Index("idx_grid_frames_run_valid", ["runId", "validTime"], { unique: true })
export class GridFrameEntity {
  @PrimaryGeneratedColumn({ type: "integer" })
  id!: number;

  @Column({ name: "run_id", type: "integer" })
  runId!: number;

  @Index("idx_grid_frames_valid_time")
  @Column({ name: "valid_time", type: "varchar", length: 30 })
  validTime!: string;

  @Column({ name: "forecast_hour", type: "real" })
  forecastHour!: number;

  @Column({ name: "ingest_job_id", type: "integer" })
  ingestJobId!: number;

  /** GridGeometry as JSON, and its key (zone masks are cached per key). */
  @Column({ type: "text" })
  geometry!: string;

  @Column({ name: "geometry_key", type: "varchar", length: 200 })
  geometryKey!: string;

  /** Isobaric levels (Pa, decreasing) of the stored 3-D input fields, as JSON. */
  @Column({ type: "text" })
  levels!: string;

  /** Copied from the run so listings need no join. */
  @Column({ type: "varchar", length: 60 })
  model!: string;

  @Column({ name: "run_time", type: "varchar", length: 30 })
  runTime!: string;

  /** Folder of this frame's Float32 field files, relative to DATA_DIR. */
  @Column({ type: "varchar", length: 300 })
  folder!: string;

  @Column({ name: "created_at", type: "varchar", length: 30 })
  createdAt!: string;
}
