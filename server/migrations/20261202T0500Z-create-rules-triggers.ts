import type { MigrationInterface, QueryRunner } from "typeorm";

/** Rules with immutable versions, per-frame evaluations, triggers and their events. */
export class CreateRulesTriggers20261202T0500Z implements MigrationInterface {
  name = "CreateRulesTriggers20261202T0500Z";

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE "rules" (
      "id" integer PRIMARY KEY AUTOINCREMENT NOT NULL,
      "name" varchar(120) NOT NULL,
      "enabled" boolean NOT NULL DEFAULT (1),
      "current_version_id" integer,
      "archived" boolean NOT NULL DEFAULT (0),
      "created_by" varchar(64),
      "created_at" varchar(30) NOT NULL,
      "updated_at" varchar(30) NOT NULL
    )`);
    await q.query(`CREATE TABLE "rule_versions" (
      "id" integer PRIMARY KEY AUTOINCREMENT NOT NULL,
      "rule_id" integer NOT NULL,
      "version" integer NOT NULL,
      "definition" text NOT NULL,
      "created_by" varchar(64),
      "created_at" varchar(30) NOT NULL,
      "change_note" varchar(500) NOT NULL
    )`);
    await q.query(`CREATE UNIQUE INDEX "idx_rule_versions_rule_version" ON "rule_versions" ("rule_id", "version")`);
    // Versions are immutable: the database refuses edits.
    await q.query(`CREATE TRIGGER "rule_versions_no_update" BEFORE UPDATE ON "rule_versions"
      BEGIN SELECT RAISE(ABORT, 'rule versions are immutable'); END`);
    await q.query(`CREATE TABLE "rule_evaluations" (
      "id" integer PRIMARY KEY AUTOINCREMENT NOT NULL,
      "rule_id" integer NOT NULL,
      "rule_version_id" integer NOT NULL,
      "zone_id" integer NOT NULL,
      "frame_id" integer NOT NULL,
      "model" varchar(60) NOT NULL,
      "run_time" varchar(30) NOT NULL,
      "valid_time" varchar(30) NOT NULL,
      "met" boolean NOT NULL,
      "summary" text NOT NULL,
      "reason" varchar(400) NOT NULL,
      "trigger_id" integer,
      "evaluated_at" varchar(30) NOT NULL
    )`);
    await q.query(`CREATE UNIQUE INDEX "idx_rule_evaluations_unique" ON "rule_evaluations" ("rule_version_id", "zone_id", "frame_id")`);
    await q.query(`CREATE INDEX "idx_rule_evaluations_run" ON "rule_evaluations" ("rule_id", "zone_id", "run_time")`);
    await q.query(`CREATE TABLE "triggers" (
      "id" integer PRIMARY KEY AUTOINCREMENT NOT NULL,
      "trigger_key" varchar(120) NOT NULL,
      "rule_id" integer NOT NULL,
      "rule_version_id" integer NOT NULL,
      "zone_id" integer NOT NULL,
      "severity" varchar(12) NOT NULL,
      "state" varchar(16) NOT NULL,
      "model" varchar(60) NOT NULL,
      "run_time" varchar(30) NOT NULL,
      "first_valid_time" varchar(30) NOT NULL,
      "last_valid_time" varchar(30) NOT NULL,
      "matched_valid_times" text NOT NULL,
      "peak" text NOT NULL,
      "opened_at" varchar(30) NOT NULL,
      "updated_at" varchar(30) NOT NULL,
      "acknowledged_by" varchar(64),
      "acknowledged_at" varchar(30),
      "closed_at" varchar(30),
      "closed_by" varchar(64),
      "close_reason" varchar(500)
    )`);
    await q.query(`CREATE UNIQUE INDEX "idx_triggers_key" ON "triggers" ("trigger_key")`);
    await q.query(`CREATE INDEX "idx_triggers_rule_zone_state" ON "triggers" ("rule_id", "zone_id", "state")`);
    await q.query(`CREATE INDEX "idx_triggers_state" ON "triggers" ("state")`);
    await q.query(`CREATE INDEX "idx_triggers_opened_at" ON "triggers" ("opened_at")`);
    await q.query(`CREATE TABLE "trigger_events" (
      "id" integer PRIMARY KEY AUTOINCREMENT NOT NULL,
      "trigger_id" integer NOT NULL,
      "kind" varchar(24) NOT NULL,
      "at" varchar(30) NOT NULL,
      "actor" varchar(64),
      "note" varchar(2000),
      "data" text
    )`);
    await q.query(`CREATE INDEX "idx_trigger_events_trigger" ON "trigger_events" ("trigger_id")`);
    await q.query(`CREATE INDEX "idx_trigger_events_at" ON "trigger_events" ("at")`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP INDEX "idx_trigger_events_at"`);
    await q.query(`DROP INDEX "idx_trigger_events_trigger"`);
    await q.query(`DROP TABLE "trigger_events"`);
    await q.query(`DROP INDEX "idx_triggers_opened_at"`);
    await q.query(`DROP INDEX "idx_triggers_state"`);
    await q.query(`DROP INDEX "idx_triggers_rule_zone_state"`);
    await q.query(`DROP INDEX "idx_triggers_key"`);
    await q.query(`DROP TABLE "triggers"`);
    await q.query(`DROP INDEX "idx_rule_evaluations_run"`);
    await q.query(`DROP INDEX "idx_rule_evaluations_unique"`);
    await q.query(`DROP TABLE "rule_evaluations"`);
    await q.query(`DROP TRIGGER "rule_versions_no_update"`);
    await q.query(`DROP INDEX "idx_rule_versions_rule_version"`);
    await q.query(`DROP TABLE "rule_versions"`);
    await q.query(`DROP TABLE "rules"`);
  }
}
