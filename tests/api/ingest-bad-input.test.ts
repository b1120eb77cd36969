import { afterAll, beforeAll, describe, expect, it } from "vitest";
import fs from "node:fs";
import path from "node:path";
import request from "supertest";
import { startTestServer, ingestBytes, type TestServer } from "../helpers/test-server.ts";
import { demoGribFile } from "../../server/demo/demo-run.ts";
import { IngestJobEntity } from "../../server/entities/ingest-job.entity.ts";
import { GridFrameEntity } from "../../server/entities/grid-frame.entity.ts";
import { FieldInfoEntity } from "../../server/entities/field-info.entity.ts";

/**
 * Broken files through the real decoders and the real ingest job: each fails its own job with a
 * reason a person can act on, leaves no partial frame, touches no other run, and the server keeps
 * answering throughout.
 */
let server: TestServer;
const runTime = new Date("2026-05-14T12:00:00Z");
// A small version of the invented demo grid keeps the test fast.
const small = (hour: number) => Buffer.from(demoGribFile({ runTime, forecastHours: [1, 2], nx: 20, ny: 16 }, hour));

function u32(bytes: Uint8Array, offset: number): number {
  return new DataView(bytes.buffer, bytes.byteOffset).getUint32(offset, false);
}
/** Offset of section `number` in the first message. */
function sectionOffset(bytes: Uint8Array, number: number): number {
  let pos = 16;
  while (bytes[pos + 4] !== number) pos += u32(bytes, pos);
  return pos;
}

async function failedReason(bytes: Buffer, name: string): Promise<string> {
  const { job } = await ingestBytes(server, bytes, name);
  const stored = await server.dataSource.getRepository(IngestJobEntity).findOneByOrFail({ id: job.id });
  expect(stored.state, name).toBe("failed");
  expect(await server.dataSource.getRepository(GridFrameEntity).countBy({ ingestJobId: job.id })).toBe(0);
  return stored.failureReason ?? "";
}

let goodFrame: GridFrameEntity;
beforeAll(async () => {
  server = await startTestServer();
  await ingestBytes(server, small(1), "good.grib2");
  goodFrame = await server.dataSource.getRepository(GridFrameEntity).findOneOrFail({ where: {} });
});
afterAll(async () => server.close());

describe("bad grid files", () => {
  it("ingests the good file through the real GRIB2 decoder", async () => {
    expect(goodFrame.model).toBe("Bellwether demo model (invented)");
    expect(goodFrame.forecastHour).toBe(1);
    expect(await server.dataSource.getRepository(FieldInfoEntity).countBy({ frameId: goodFrame.id })).toBeGreaterThan(40);
  });

  it("fails a truncated file", async () => {
    const bytes = small(2);
    expect(await failedReason(bytes.subarray(0, Math.floor(bytes.length / 2)), "truncated.grib2")).toMatch(/truncated|ends|beyond/i);
  });

  it("fails a file whose section length is wrong", async () => {
    const bytes = Buffer.from(small(2));
    const s3 = sectionOffset(bytes, 3);
    new DataView(bytes.buffer, bytes.byteOffset).setUint32(s3, u32(bytes, s3) + 7, false);
    expect(await failedReason(bytes, "section-length.grib2")).toMatch(/section/i);
  });

  it("fails a file that declares more bytes than it holds", async () => {
    const bytes = Buffer.from(small(2));
    new DataView(bytes.buffer, bytes.byteOffset).setBigUint64(8, BigInt(bytes.length * 4), false);
    expect(await failedReason(bytes, "declared-size.grib2")).toMatch(/truncated|beyond|declares|ends/i);
  });

  it("fails a file with an unknown grid template, naming it", async () => {
    const bytes = Buffer.from(small(2));
    const s3 = sectionOffset(bytes, 3);
    new DataView(bytes.buffer, bytes.byteOffset).setUint16(s3 + 12, 99, false);
    expect(await failedReason(bytes, "template.grib2")).toMatch(/template 3\.99|3\.99|template 99/);
  });

  it("fails a file holding only a field of missing values, listing what a frame needs", async () => {
    const bytes = fs.readFileSync("tests/fixtures/grib2/bitmap-all-missing.grib2");
    expect(await failedReason(bytes, "all-missing.grib2")).toMatch(/Missing required fields/);
  });

  it("fails a file that is not a grid at all", async () => {
    expect(await failedReason(Buffer.from("station,temperature\nOKC,31\n"), "notes.csv")).toMatch(/neither GRIB2 nor NetCDF/);
  });

  it("kept serving and kept the good run intact throughout", async () => {
    const health = await Promise.all(Array.from({ length: 5 }, () => request(server.app).get("/api/health")));
    expect(health.map((r) => r.status)).toEqual([200, 200, 200, 200, 200]);
    const frames = await server.dataSource.getRepository(GridFrameEntity).find();
    expect(frames.map((f) => f.id)).toEqual([goodFrame.id]);
    expect(fs.existsSync(path.join(server.dataDir, goodFrame.folder, "fields", "mlcape.f32"))).toBe(true);
  });
});
