import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { startTestServer, signIn, ingestBytes, type SignedInAgent, type TestServer } from "../helpers/test-server.ts";
import { fakeGribBytes, syntheticRecords, SYNTHETIC_GEOMETRY } from "../helpers/synthetic-grid.ts";
import { demoZones } from "../../server/demo/demo-zones.ts";
import { zoneGeometryProblems, zoneMask, ringsContain, type ZoneGeometry } from "../../shared/zones/zone-geometry.ts";
import { gridCoordinates } from "../../shared/grid/grid-coordinates.ts";

let server: TestServer;
let lead: SignedInAgent;
const post = (path: string, body: object) => lead.agent.post(path).set("x-csrf-token", lead.csrf).send(body);

// A square around the synthetic grid's points (34–36° N, 100–97.5° W).
const square = (west: number, south: number, east: number, north: number) =>
  ({ type: "Polygon", coordinates: [[[west, south], [east, south], [east, north], [west, north], [west, south]]] }) as ZoneGeometry & { type: "Polygon" };

beforeAll(async () => {
  server = await startTestServer({}, { decode: () => syntheticRecords() });
  lead = await signIn(server.app, "lead");
  await ingestBytes(server, fakeGribBytes("zones"), "zones.grib2");
});
afterAll(async () => server.close());

describe("zone geometry checks", () => {
  it("accepts the demo zones", () => {
    for (const z of demoZones()) expect(zoneGeometryProblems(z.geometry)).toEqual([]);
  });

  it("names a self-intersecting ring, an open ring and a short ring", () => {
    const bowtie = { type: "Polygon", coordinates: [[[0, 0], [1, 1], [1, 0], [0, 1], [0, 0]]] } as ZoneGeometry;
    expect(zoneGeometryProblems(bowtie)[0]).toMatch(/crosses itself between vertices 1–2 and 3–4/);
    const open = { type: "Polygon", coordinates: [[[0, 0], [1, 0], [1, 1], [0, 1]]] } as ZoneGeometry;
    expect(zoneGeometryProblems(open)[0]).toMatch(/not closed/);
    const short = { type: "Polygon", coordinates: [[[0, 0], [1, 0], [0, 0]]] } as ZoneGeometry;
    expect(zoneGeometryProblems(short)[0]).toMatch(/at least 4 positions/);
  });

  it("tells inside from outside, holes included", () => {
    // Common practice (no source): the even-odd rule leaves a hole's interior outside the polygon.
    const rings = [square(0, 0, 10, 10).coordinates[0]!, square(4, 4, 6, 6).coordinates[0]!] as number[][][];
    expect(ringsContain(rings, 2, 2)).toBe(true);
    expect(ringsContain(rings, 5, 5)).toBe(false);
    expect(ringsContain(rings, 11, 5)).toBe(false);
  });

  it("masks exactly the grid points inside the polygon", () => {
    const { lat, lon } = gridCoordinates(SYNTHETIC_GEOMETRY);
    const mask = zoneMask(square(-99.25, 34.75, -98.25, 35.75), lat, lon);
    // Points every 0.5° from 100° W and 34° N: inside are lon −99, −98.5 and lat 35, 35.5.
    expect(mask.reduce((a, b) => a + b, 0)).toBe(4);
  });
});

describe("zones API", () => {
  it("creates a zone, reports its coverage of each stored grid, and audits it", async () => {
    const res = await post("/api/zones", { code: "abc", name: "Test zone", geometry: square(-99.25, 34.75, -98.25, 35.75) });
    expect(res.status).toBe(201);
    expect(res.body.zone).toMatchObject({ code: "ABC", coversNothing: false });
    expect(res.body.zone.coverage[0].points).toBe(4);
    const manager = await signIn(server.app, "manager");
    const audit = await manager.agent.get("/api/audit?action=zone.created");
    expect(audit.body.entries[0].after.code).toBe("ABC");
  });

  it("flags a zone that covers no point of a stored grid", async () => {
    const res = await post("/api/zones", { code: "FAR", name: "Far away", geometry: square(10, 10, 11, 11) });
    expect(res.body.zone.coversNothing).toBe(true);
  });

  it("refuses a self-intersecting ring with the reason and stores nothing", async () => {
    const before = (await lead.agent.get("/api/zones")).body.zones.length;
    const res = await post("/api/zones", { code: "BAD", name: "Bow tie", geometry: { type: "Polygon", coordinates: [[[0, 0], [1, 1], [1, 0], [0, 1], [0, 0]]] } });
    expect(res.status).toBe(400);
    expect(res.body.error.message).toContain("crosses itself");
    expect((await lead.agent.get("/api/zones")).body.zones.length).toBe(before);
  });

  it("refuses what is not GeoJSON", async () => {
    const res = await post("/api/zones", { code: "X", name: "X", geometry: { type: "Circle", center: [0, 0] } });
    expect(res.status).toBe(400);
    expect(res.body.error.message).toContain("geometry");
  });

  it("imports a FeatureCollection all or nothing", async () => {
    const features = demoZones().map((z) => ({ type: "Feature", properties: { code: z.code, name: z.name }, geometry: z.geometry }));
    const broken = [...features, { type: "Feature", properties: { code: "ZZZ", name: "Broken" }, geometry: { type: "Polygon", coordinates: [[[0, 0], [1, 1], [1, 0], [0, 1], [0, 0]]] } }];
    const refused = await post("/api/zones/import", { type: "FeatureCollection", features: broken });
    expect(refused.status).toBe(400);
    expect(refused.body.error.message).toContain("ZZZ");
    const codes = (await lead.agent.get("/api/zones")).body.zones.map((z: { code: string }) => z.code);
    expect(codes).not.toContain("CWB");
    const accepted = await lead.agent.post("/api/zones/import").set("x-csrf-token", lead.csrf).attach("file", Buffer.from(JSON.stringify({ type: "FeatureCollection", features })), "zones.geojson");
    expect(accepted.status).toBe(201);
    expect(accepted.body.zones).toHaveLength(8);
  });

  it("recomputes the mask when the shape changes, and archives on delete", async () => {
    const created = (await post("/api/zones", { code: "MOV", name: "Moving", geometry: square(-99.25, 34.75, -98.25, 35.75) })).body.zone;
    const moved = await lead.agent.patch(`/api/zones/${created.id}`).set("x-csrf-token", lead.csrf).send({ geometry: square(-100.1, 33.9, -97.4, 36.1) });
    expect(moved.body.zone.coverage[0].points).toBe(SYNTHETIC_GEOMETRY.nx * SYNTHETIC_GEOMETRY.ny);
    expect((await lead.agent.delete(`/api/zones/${created.id}`).set("x-csrf-token", lead.csrf)).status).toBe(204);
    expect((await lead.agent.get(`/api/zones/${created.id}`)).status).toBe(404);
  });

  it("lets forecasters read zones but not change them", async () => {
    const forecaster = await signIn(server.app, "forecaster");
    expect((await forecaster.agent.get("/api/zones")).status).toBe(200);
    const res = await forecaster.agent.post("/api/zones").set("x-csrf-token", forecaster.csrf).send({ code: "NO", name: "No", geometry: square(0, 0, 1, 1) });
    expect(res.status).toBe(403);
  });
});
