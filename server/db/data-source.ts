import "reflect-metadata";
import { DataSource, type EntityManager } from "typeorm";
import PQueue from "p-queue";
import { ENTITIES } from "./entities.ts";
import { MIGRATIONS } from "./migrations.ts";

export interface DataSourceOptions {
  /** SQLite file path, or ":memory:". */
  database: string;
  /** Only tests may ask for schema synchronisation; production runs migrations. */
  synchronize?: boolean;
}

/** A TypeORM data source over SQLite (better-sqlite3) with WAL and a busy timeout. */
export function createDataSource(options: DataSourceOptions): DataSource {
  return new DataSource({
    type: "better-sqlite3",
    database: options.database,
    entities: ENTITIES,
    migrations: MIGRATIONS,
    migrationsTransactionMode: "each",
    synchronize: options.synchronize ?? false,
    enableWAL: options.database !== ":memory:",
    timeout: 5000,
    prepareDatabase: (db: { pragma: (s: string) => unknown }) => {
      db.pragma("foreign_keys = ON");
      db.pragma("synchronous = NORMAL");
    },
    logging: false,
  });
}

/** Opens the data source and brings the schema up to date. */
export async function openDatabase(options: DataSourceOptions): Promise<DataSource> {
  const dataSource = createDataSource(options);
  await dataSource.initialize();
  if (!options.synchronize) await dataSource.runMigrations({ transaction: "each" });
  return dataSource;
}

// One SQLite connection serves the whole process, so transactions must not interleave on it.
// Every writing transaction goes through this queue, one at a time.
const writeQueues = new WeakMap<DataSource, PQueue>();

/** Runs `work` inside a transaction, serialised with every other write on this data source. */
export function writeTransaction<T>(dataSource: DataSource, work: (manager: EntityManager) => Promise<T>): Promise<T> {
  let queue = writeQueues.get(dataSource);
  if (!queue) {
    queue = new PQueue({ concurrency: 1 });
    writeQueues.set(dataSource, queue);
  }
  return queue.add(() => dataSource.transaction(work)) as Promise<T>;
}
