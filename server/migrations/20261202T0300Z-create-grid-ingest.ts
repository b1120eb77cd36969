import type { MigrationInterface, QueryRunner } from "typeorm";

/** Ingest jobs, model runs, frames and the metadata of stored fields. */
export class CreateGridIngest20261202T0300Z implements MigrationInterface {
  name = "CreateGridIngest20261202T0300Z";

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE "ingest_jobs" (
      "id" integer PRIMARY KEY AUTOINCREMENT NOT NULL,
      "sha256" varchar(64) NOT NULL,
      "source" varchar(12) NOT NULL,
      "original_name" varchar(255) NOT NULL,
      "stored_path" varchar(400) NOT NULL,
      "size_bytes" integer NOT NULL,
      "format" varchar(12) NOT NULL,
      "state" varchar(12) NOT NULL,
      "progress" real NOT NULL DEFAULT (0),
      "stage_note" varchar(200),
      "failure_reason" text,
      "ignored_fields" text,
      "submitted_by" varchar(64),
      "created_at" varchar(30) NOT NULL,
      "started_at" varchar(30),
      "finished_at" varchar(30),
      "frame_count" integer NOT NULL DEFAULT (0)
    )`);
    await q.query(`CREATE UNIQUE INDEX "idx_ingest_jobs_sha256" ON "ingest_jobs" ("sha256")`);
    await q.query(`CREATE INDEX "idx_ingest_jobs_state" ON "ingest_jobs" ("state")`);

    await q.query(`CREATE TABLE "model_runs" (
      "id" integer PRIMARY KEY AUTOINCREMENT NOT NULL,
      "model" varchar(60) NOT NULL,
      "run_time" varchar(30) NOT NULL,
      "created_at" varchar(30) NOT NULL
    )`);
    await q.query(`CREATE UNIQUE INDEX "idx_model_runs_model_time" ON "model_runs" ("model", "run_time")`);

    await q.query(`CREATE TABLE "grid_frames" (
      "id" integer PRIMARY KEY AUTOINCREMENT NOT NULL,
      "run_id" integer NOT NULL,
      "valid_time" varchar(30) NOT NULL,
      "forecast_hour" real NOT NULL,
      "ingest_job_id" integer NOT NULL,
      "geometry" text NOT NULL,
      "geometry_key" varchar(200) NOT NULL,
      "levels" text NOT NULL,
      "model" varchar(60) NOT NULL,
      "run_time" varchar(30) NOT NULL,
      "folder" varchar(300) NOT NULL,
      "created_at" varchar(30) NOT NULL
    )`);
    await q.query(`CREATE UNIQUE INDEX "idx_grid_frames_run_valid" ON "grid_frames" ("run_id", "valid_time")`);
    await q.query(`CREATE INDEX "idx_grid_frames_valid_time" ON "grid_frames" ("valid_time")`);

    await q.query(`CREATE TABLE "field_infos" (
      "id" integer PRIMARY KEY AUTOINCREMENT NOT NULL,
      "frame_id" integer NOT NULL,
      "key" varchar(60) NOT NULL,
      "unit" varchar(30) NOT NULL,
      "min" real,
      "max" real,
      "nan_count" integer NOT NULL,
      "file" varchar(300) NOT NULL
    )`);
    await q.query(`CREATE UNIQUE INDEX "idx_field_infos_frame_key" ON "field_infos" ("frame_id", "key")`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP INDEX "idx_field_infos_frame_key"`);
    await q.query(`DROP TABLE "field_infos"`);
    await q.query(`DROP INDEX "idx_grid_frames_valid_time"`);
    await q.query(`DROP INDEX "idx_grid_frames_run_valid"`);
    await q.query(`DROP TABLE "grid_frames"`);
    await q.query(`DROP INDEX "idx_model_runs_model_time"`);
    await q.query(`DROP TABLE "model_runs"`);
    await q.query(`DROP INDEX "idx_ingest_jobs_state"`);
    await q.query(`DROP INDEX "idx_ingest_jobs_sha256"`);
    await q.query(`DROP TABLE "ingest_jobs"`);
  }
}
