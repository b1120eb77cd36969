import type { MigrationInterface, QueryRunner } from "typeorm";

/** Accounts, sessions and the hash-chained audit trail. */
export class CreateFoundation20261202T0200Z implements MigrationInterface {
  name = "CreateFoundation20261202T0200Z";

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE "users" (
      "id" integer PRIMARY KEY AUTOINCREMENT NOT NULL,
      "username" varchar(64) NOT NULL,
      "display_name" varchar(120) NOT NULL,
      "password_hash" varchar(100) NOT NULL,
      "roles" text NOT NULL,
      "disabled" boolean NOT NULL DEFAULT (0),
      "created_at" datetime NOT NULL DEFAULT (datetime('now')),
      "last_login_at" datetime
    )`);
    await q.query(`CREATE UNIQUE INDEX "idx_users_username" ON "users" ("username")`);

    await q.query(`CREATE TABLE "sessions" (
      "id" varchar(255) PRIMARY KEY NOT NULL,
      "expired_at" bigint NOT NULL,
      "json" text NOT NULL,
      "destroyed_at" datetime
    )`);
    await q.query(`CREATE INDEX "idx_sessions_expired_at" ON "sessions" ("expired_at")`);

    await q.query(`CREATE TABLE "audit_entries" (
      "id" integer PRIMARY KEY AUTOINCREMENT NOT NULL,
      "at" varchar(30) NOT NULL,
      "actor" varchar(64),
      "actor_roles" text NOT NULL,
      "action" varchar(80) NOT NULL,
      "target_type" varchar(80) NOT NULL,
      "target_id" varchar(120),
      "before_json" text,
      "after_json" text,
      "request_id" varchar(64),
      "prev_hash" varchar(64) NOT NULL,
      "hash" varchar(64) NOT NULL
    )`);
    await q.query(`CREATE INDEX "idx_audit_at" ON "audit_entries" ("at")`);
    await q.query(`CREATE INDEX "idx_audit_actor" ON "audit_entries" ("actor")`);
    await q.query(`CREATE INDEX "idx_audit_action" ON "audit_entries" ("action")`);
    // Append-only: the database itself refuses edits and deletes of audit rows. Tampering then
    // needs a deliberate trigger drop, and the hash chain still shows it.
    await q.query(`CREATE TRIGGER "audit_entries_no_update" BEFORE UPDATE ON "audit_entries"
      BEGIN SELECT RAISE(ABORT, 'audit entries are append-only'); END`);
    await q.query(`CREATE TRIGGER "audit_entries_no_delete" BEFORE DELETE ON "audit_entries"
      BEGIN SELECT RAISE(ABORT, 'audit entries are append-only'); END`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TRIGGER "audit_entries_no_delete"`);
    await q.query(`DROP TRIGGER "audit_entries_no_update"`);
    await q.query(`DROP INDEX "idx_audit_action"`);
    await q.query(`DROP INDEX "idx_audit_actor"`);
    await q.query(`DROP INDEX "idx_audit_at"`);
    await q.query(`DROP TABLE "audit_entries"`);
    await q.query(`DROP INDEX "idx_sessions_expired_at"`);
    await q.query(`DROP TABLE "sessions"`);
    await q.query(`DROP INDEX "idx_users_username"`);
    await q.query(`DROP TABLE "users"`);
  }
}
