import type { MigrationInterface, QueryRunner } from "typeorm";

/** Forecast zones and their cached grid masks. */
export class CreateZones20261202T0400Z implements MigrationInterface {
  name = "CreateZones20261202T0400Z";

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE "zones" (
      "id" integer PRIMARY KEY AUTOINCREMENT NOT NULL,
      "code" varchar(20) NOT NULL,
      "name" varchar(120) NOT NULL,
      "geometry" text NOT NULL,
      "archived" boolean NOT NULL DEFAULT (0),
      "created_at" varchar(30) NOT NULL,
      "updated_at" varchar(30) NOT NULL
    )`);
    await q.query(`CREATE UNIQUE INDEX "idx_zones_code" ON "zones" ("code")`);
    await q.query(`CREATE TABLE "zone_masks" (
      "id" integer PRIMARY KEY AUTOINCREMENT NOT NULL,
      "zone_id" integer NOT NULL,
      "geometry_key" varchar(200) NOT NULL,
      "zone_updated_at" varchar(30) NOT NULL,
      "point_count" integer NOT NULL,
      "mask" blob NOT NULL
    )`);
    await q.query(`CREATE UNIQUE INDEX "idx_zone_masks_zone_grid" ON "zone_masks" ("zone_id", "geometry_key")`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP INDEX "idx_zone_masks_zone_grid"`);
    await q.query(`DROP TABLE "zone_masks"`);
    await q.query(`DROP INDEX "idx_zones_code"`);
    await q.query(`DROP TABLE "zones"`);
  }
}
