import type { MigrationInterface, QueryRunner } from "typeorm";

/** Observed storm reports, the ground truth for rule verification. */
export class CreateStormReports20261202T0700Z implements MigrationInterface {
  name = "CreateStormReports20261202T0700Z";

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE "storm_reports" (
      "id" integer PRIMARY KEY AUTOINCREMENT NOT NULL,
      "time" varchar(30) NOT NULL,
      "latitude" real NOT NULL,
      "longitude" real NOT NULL,
      "kind" varchar(12) NOT NULL,
      "magnitude" real,
      "magnitude_unit" varchar(8),
      "magnitude_si" real,
      "remarks" varchar(500) NOT NULL,
      "source" varchar(200) NOT NULL,
      "invented" boolean NOT NULL DEFAULT (0),
      "uploaded_by" varchar(64),
      "uploaded_at" varchar(30) NOT NULL
    )`);
    await q.query(`CREATE INDEX "idx_storm_reports_time" ON "storm_reports" ("time")`);
    await q.query(`CREATE INDEX "idx_storm_reports_kind_time" ON "storm_reports" ("kind", "time")`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP INDEX "idx_storm_reports_kind_time"`);
    await q.query(`DROP INDEX "idx_storm_reports_time"`);
    await q.query(`DROP TABLE "storm_reports"`);
  }
}
