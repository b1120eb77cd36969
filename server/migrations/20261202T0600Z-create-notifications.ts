import type { MigrationInterface, QueryRunner } from "typeorm";

/** Contacts, groups, on-call shifts, the notification outbox with its delivery attempts, and notification settings. */
export class CreateNotifications20261202T0600Z implements MigrationInterface {
  name = "CreateNotifications20261202T0600Z";

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE "contacts" (
      "id" integer PRIMARY KEY AUTOINCREMENT NOT NULL,
      "name" varchar(120) NOT NULL,
      "organisation" varchar(120) NOT NULL DEFAULT (''),
      "email" varchar(254),
      "mobile" varchar(16),
      "channels" text NOT NULL,
      "quiet_hours" text,
      "user_id" integer,
      "active" boolean NOT NULL DEFAULT (1),
      "created_at" varchar(30) NOT NULL,
      "updated_at" varchar(30) NOT NULL
    )`);
    await q.query(`CREATE INDEX "idx_contacts_user" ON "contacts" ("user_id")`);
    await q.query(`CREATE TABLE "contact_groups" (
      "id" integer PRIMARY KEY AUTOINCREMENT NOT NULL,
      "name" varchar(120) NOT NULL,
      "description" varchar(500) NOT NULL DEFAULT (''),
      "created_at" varchar(30) NOT NULL,
      "updated_at" varchar(30) NOT NULL
    )`);
    await q.query(`CREATE UNIQUE INDEX "idx_contact_groups_name" ON "contact_groups" ("name")`);
    await q.query(`CREATE TABLE "contact_group_members" (
      "group_id" integer NOT NULL,
      "contact_id" integer NOT NULL,
      PRIMARY KEY ("group_id", "contact_id")
    )`);
    await q.query(`CREATE INDEX "idx_contact_group_members_contact" ON "contact_group_members" ("contact_id")`);
    await q.query(`CREATE TABLE "on_call_shifts" (
      "id" integer PRIMARY KEY AUTOINCREMENT NOT NULL,
      "contact_id" integer NOT NULL,
      "role" varchar(16) NOT NULL,
      "starts_at" varchar(30) NOT NULL,
      "ends_at" varchar(30) NOT NULL,
      "note" varchar(200) NOT NULL DEFAULT ('')
    )`);
    await q.query(`CREATE INDEX "idx_on_call_shifts_contact" ON "on_call_shifts" ("contact_id")`);
    await q.query(`CREATE INDEX "idx_on_call_shifts_span" ON "on_call_shifts" ("starts_at", "ends_at")`);
    await q.query(`CREATE TABLE "notifications" (
      "id" integer PRIMARY KEY AUTOINCREMENT NOT NULL,
      "trigger_id" integer,
      "trigger_ids" text NOT NULL,
      "change" varchar(16) NOT NULL,
      "level" integer,
      "channel" varchar(8) NOT NULL,
      "contact_id" integer,
      "recipient_name" varchar(120) NOT NULL,
      "address" varchar(254) NOT NULL,
      "template" varchar(16) NOT NULL,
      "severity" varchar(12) NOT NULL,
      "idempotency_key" varchar(160) NOT NULL,
      "state" varchar(12) NOT NULL,
      "attempts" integer NOT NULL DEFAULT (0),
      "next_attempt_at" varchar(30),
      "held_until" varchar(30),
      "digest_id" integer,
      "provider_message_id" varchar(200),
      "last_error" varchar(1000),
      "created_at" varchar(30) NOT NULL,
      "updated_at" varchar(30) NOT NULL,
      "sent_at" varchar(30)
    )`);
    await q.query(`CREATE INDEX "idx_notifications_trigger" ON "notifications" ("trigger_id")`);
    await q.query(`CREATE UNIQUE INDEX "idx_notifications_key" ON "notifications" ("idempotency_key")`);
    await q.query(`CREATE INDEX "idx_notifications_due" ON "notifications" ("state", "next_attempt_at")`);
    await q.query(`CREATE TABLE "delivery_attempts" (
      "id" integer PRIMARY KEY AUTOINCREMENT NOT NULL,
      "notification_id" integer NOT NULL,
      "attempt" integer NOT NULL,
      "outcome" varchar(12) NOT NULL,
      "started_at" varchar(30) NOT NULL,
      "finished_at" varchar(30),
      "provider_message_id" varchar(200),
      "error" varchar(1000)
    )`);
    await q.query(`CREATE UNIQUE INDEX "idx_delivery_attempts_notification" ON "delivery_attempts" ("notification_id", "attempt")`);
    await q.query(`CREATE TABLE "notify_settings" (
      "key" varchar(40) PRIMARY KEY NOT NULL,
      "value" text NOT NULL,
      "updated_at" varchar(30) NOT NULL,
      "updated_by" varchar(64)
    )`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE "notify_settings"`);
    await q.query(`DROP INDEX "idx_delivery_attempts_notification"`);
    await q.query(`DROP TABLE "delivery_attempts"`);
    await q.query(`DROP INDEX "idx_notifications_due"`);
    await q.query(`DROP INDEX "idx_notifications_key"`);
    await q.query(`DROP INDEX "idx_notifications_trigger"`);
    await q.query(`DROP TABLE "notifications"`);
    await q.query(`DROP INDEX "idx_on_call_shifts_span"`);
    await q.query(`DROP INDEX "idx_on_call_shifts_contact"`);
    await q.query(`DROP TABLE "on_call_shifts"`);
    await q.query(`DROP INDEX "idx_contact_group_members_contact"`);
    await q.query(`DROP TABLE "contact_group_members"`);
    await q.query(`DROP INDEX "idx_contact_groups_name"`);
    await q.query(`DROP TABLE "contact_groups"`);
    await q.query(`DROP INDEX "idx_contacts_user"`);
    await q.query(`DROP TABLE "contacts"`);
  }
}
