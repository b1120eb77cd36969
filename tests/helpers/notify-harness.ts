import { startTestServer, ingestBytes, type TestServer } from "./test-server.ts";
import { fakeGribBytes, syntheticRecords } from "./synthetic-grid.ts";
import { testRule } from "./rule-builder.ts";
import { SYSTEM_ACTOR } from "../../server/audit/audit-log.ts";
import { TriggerEntity } from "../../server/entities/trigger.entity.ts";
import type { ServiceOverrides } from "../../server/services/container.ts";

/** A zone that covers the whole synthetic grid, so the test rule matches everywhere. */
export const WHOLE_GRID = { type: "Polygon", coordinates: [[[-100.1, 33.9], [-97.4, 33.9], [-97.4, 36.1], [-100.1, 36.1], [-100.1, 33.9]]] };
/** A smaller zone over part of the grid, so a map shows zone and surroundings. */
export const PART_OF_GRID = { type: "Polygon", coordinates: [[[-99.2, 34.6], [-98.1, 34.6], [-98.1, 35.6], [-99.2, 35.6], [-99.2, 34.6]]] };

/** Settings that make retries and polling fast enough for tests. */
export const FAST_NOTIFY_ENV = {
  PUBLIC_URL: "http://bellwether.test",
  NOTIFY_RETRY_BASE_SECONDS: "0.01",
  NOTIFY_RETRY_MAX_SECONDS: "0.05",
  NOTIFY_MAX_ATTEMPTS: "30",
  NOTIFY_POLL_SECONDS: "0.1",
  MAIL_PER_MINUTE: "100000",
  SMS_PER_MINUTE: "100000",
};

/** Each "file" is a fresh model name, so every ingest can open new triggers. */
const decodeByModel = (bytes: Uint8Array) => syntheticRecords({ model: Buffer.from(bytes).toString("latin1").slice(8) });

export interface NotifyTestServer extends TestServer {
  zoneId: number;
}

/** A real app on a SQLite file, with the local fakes and the dispatcher running. */
export async function startNotifyServer(env: Record<string, string> = {}, overrides: ServiceOverrides = {}, options: { dispatch?: boolean } = {}): Promise<NotifyTestServer> {
  const server = await startTestServer({ ...FAST_NOTIFY_ENV, ...env, NOTIFY_DISPATCH: options.dispatch === false ? "false" : "true" }, { decode: decodeByModel, ...overrides });
  await server.services.notify.start();
  const zone = await server.services.zones.create(SYSTEM_ACTOR, { code: "NTF", name: "Notify test zone", geometry: PART_OF_GRID as never });
  return { ...server, zoneId: zone.id };
}

let files = 0;

/**
 * Creates rules (each a copy of the shear test rule with overrides), puts one synthetic frame
 * through the real ingest and evaluation, and returns the triggers it opened, one per rule.
 * The rules are disabled afterwards so later calls only open their own.
 */
export async function openTriggers(server: NotifyTestServer, rules: Array<Record<string, unknown>>): Promise<TriggerEntity[]> {
  const ids: number[] = [];
  for (const over of rules) ids.push((await server.services.rules.create(SYSTEM_ACTOR, testRule([server.zoneId], { name: `Notify rule ${++files}`, ...over }) as never)).id);
  const model = `notify-${++files}`;
  await ingestBytes(server, fakeGribBytes(model), `${model}.grib2`);
  await server.services.evaluation.idle();
  for (const id of ids) await server.services.rules.setEnabled(SYSTEM_ACTOR, id, false, "test done");
  return server.dataSource.getRepository(TriggerEntity).find({ where: { model }, order: { id: "ASC" } });
}
