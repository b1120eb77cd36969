import "reflect-metadata";
import { Column, Entity, Index, PrimaryGeneratedColumn } from "typeorm";

export type IngestState = "queued" | "decoding" | "diagnosing" | "ready" | "failed";
export type IngestSource = "upload" | "inbox" | "demo";

/** One received grid file and its way through decode → diagnose → ready (or failed, with the reason). */
@Entity({ name: "ingest_jobs" })
export class IngestJobEntity {
  @PrimaryGeneratedColumn({ type: "integer" })
  id!: number;

  /** SHA-256 of the file: the same file twice is recognised and not processed again. */
  @Index("idx_ingest_jobs_sha256", { unique: true })
  @Column({ type: "varchar", length: 64 })
  sha256!: string;

  @Column({ type: "varchar", length: 12 })
  source!: IngestSource;

  @Column({ name: "original_name", type: "varchar", length: 255 })
  originalName!: string;

  /** Path of the kept file, relative to DATA_DIR. */
  @Column({ name: "stored_path", type: "varchar", length: 400 })
  storedPath!: string;

  @Column({ name: "size_bytes", type: "integer" })
  sizeBytes!: number;

  @Column({ type: "varchar", length: 12 })
  format!: string;

  @Index("idx_ingest_jobs_state")
  @Column({ type: "varchar", length: 12 })
  state!: IngestState;

  /** 0..1 within the whole job. */
  @Column({ type: "real", default: 0 })
  progress!: number;

  @Column({ name: "stage_note", type: "varchar", length: 200, nullable: true })
  stageNote!: string | null;

  @Column({ name: "failure_reason", type: "text", nullable: true })
  failureReason!: string | null;

  /** Fields the file carried that Bellwether does not use (listed, not an error). */
  @Column({ name: "ignored_fields", type: "text", nullable: true })
  ignoredFields!: string | null;

  @Column({ name: "submitted_by", type: "varchar", length: 64, nullable: true })
  submittedBy!: string | null;

  @Column({ name: "created_at", type: "varchar", length: 30 })
  createdAt!: string;

  @Column({ name: "started_at", type: "varchar", length: 30, nullable: true })
  startedAt!: string | null;

  @Column({ name: "finished_at", type: "varchar", length: 30, nullable: true })
  finishedAt!: string | null;

  @Column({ name: "frame_count", type: "integer", default: 0 })
  frameCount!: number;
}
