import { describe, expect, it } from "vitest";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { createDataSource } from "../../server/db/data-source.ts";

describe("migrations", () => {
  it("go up, down and up again, and leave the schema exactly as the entities describe it", async () => {
    const dir = fs.mkdtempSync(path.join(os.tmpdir(), "bellwether-migrate-"));
    const ds = createDataSource({ database: path.join(dir, "m.sqlite") });
    await ds.initialize();
    try {
      const ran = await ds.runMigrations();
      expect(ran.length).toBeGreaterThan(0);
      for (let i = 0; i < ran.length; i++) await ds.undoLastMigration();
      const tables = await ds.query(`SELECT name FROM sqlite_master WHERE type='table' AND name NOT IN ('migrations','sqlite_sequence')`);
      expect(tables).toEqual([]);
      await ds.runMigrations();
      // Schema drift check: TypeORM would generate no statements to sync entities to this schema.
      const pending = await ds.driver.createSchemaBuilder().log();
      expect(pending.upQueries.map((q) => q.query)).toEqual([]);
    } finally {
      await ds.destroy();
      fs.rmSync(dir, { recursive: true, force: true });
    }
  });
});
