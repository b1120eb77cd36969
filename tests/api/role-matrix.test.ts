import { afterAll, beforeAll, describe, expect, it } from "vitest";
import fs from "node:fs";
import { ROLES, PERMISSIONS, type Role } from "../../shared/auth/permissions.ts";
import { startTestServer, signIn, anonymous, ingestBytes, insertOpenTrigger, DEMO_USER_FOR_ROLE, type SignedInAgent, type TestServer } from "../helpers/test-server.ts";
import { fakeGribBytes, syntheticRecords } from "../helpers/synthetic-grid.ts";
import { SYSTEM_ACTOR } from "../../server/audit/audit-log.ts";
import { DEFAULT_TEMPLATES } from "../../shared/api/notifications.ts";
import { deliverFakeMail, insertNotification, makeContact, makeGroup, makeShift } from "../helpers/notify-fixtures.ts";
import { testRule } from "../helpers/rule-builder.ts";
import type { HttpMethod, RouteEntry } from "../../server/http/route-table.ts";

/**
 * Walks every registered API route for every role (and for a visitor who is not signed in) and
 * checks the guard: 401 without a session, 403 for roles without the permission, 2xx otherwise.
 * A route added without an example here fails the coverage test, so the matrix stays complete.
 */
interface Example {
  /** Concrete path (ids filled in). */
  path: string;
  body?: () => unknown;
  /** Multipart upload: field name, content, file name. */
  attach?: () => [string, Buffer, string];
  /** A Server-Sent Events stream: only the status is read, then the connection is dropped. */
  stream?: boolean;
  /** Creates what the call needs and returns the concrete path. */
  prepare?: () => Promise<string>;
}

let counter = 0;
const RULE = (over: Record<string, unknown> = {}) => testRule([1], { name: "Matrix rule", description: "", ...over });
const SQUARE = { type: "Polygon", coordinates: [[[-99, 35], [-98, 35], [-98, 36], [-99, 36], [-99, 35]]] };
const SOUNDING = fs.readFileSync("tests/fixtures/soundings/demo-warm-sector.csv", "utf8");
const EXAMPLES: Record<string, Example> = {
  "get /api/health/": { path: "/api/health" },
  "get /api/auth/csrf": { path: "/api/auth/csrf" },
  "post /api/auth/login": { path: "/api/auth/login", body: () => ({ username: "forecaster", password: "test-password-123" }) },
  "post /api/auth/logout": { path: "/api/auth/logout" },
  "get /api/auth/me": { path: "/api/auth/me" },
  "get /api/users/": { path: "/api/users" },
  "post /api/users/": {
    path: "/api/users",
    body: () => ({ username: `matrix-${++counter}`, displayName: "Matrix probe", password: "matrix-password-1", roles: ["forecaster"] }),
  },
  "patch /api/users/:id": { path: "/api/users/2", body: () => ({ displayName: `Renamed ${++counter}` }) },
  "post /api/users/:id/password": { path: "/api/users/2/password", body: () => ({ password: "another-password-1" }) },
  "get /api/audit/": { path: "/api/audit?page=1&pageSize=5" },
  "get /api/audit/verify": { path: "/api/audit/verify" },
  "get /api/audit/export.csv": { path: "/api/audit/export.csv?action=user." },
  "get /api/history/triggers": { path: "/api/history/triggers?severity=serious" },
  "get /api/history/triggers.csv": { path: "/api/history/triggers.csv?ruleId=1" },
  "get /api/history/triggers/:id": { path: "/api/history/triggers/1" },
  "get /api/storm-reports/": { path: "/api/storm-reports?kind=hail" },
  "post /api/storm-reports/": {
    path: "/api/storm-reports",
    // A new place each time, so every cell stores a report rather than finding a duplicate.
    body: () => ({ csv: `time_utc,latitude,longitude,kind,magnitude,magnitude_unit,remarks\n2026-05-14T21:35Z,${30 + ++counter * 0.1},-97.4,hail,1,in,matrix`, fileName: "matrix.csv" }),
  },
  "get /api/verification/": { path: "/api/verification?from=2000-01-01T00:00:00Z&to=2100-01-01T00:00:00Z&ruleId=1" },
  "get /api/verification/compare": {
    path: "",
    prepare: async () => {
      // Two versions of rule 1 to compare; other cells may already have added some.
      let versions = await server.services.rules.versions(1);
      if (versions.length < 2) {
        await server.services.rules.update(SYSTEM_ACTOR, 1, { ...RULE({ description: `Compare ${++counter}` }), changeNote: "matrix" } as never);
        versions = await server.services.rules.versions(1);
      }
      return `/api/verification/compare?ruleId=1&versionA=${versions[1]!.id}&versionB=${versions[0]!.id}&runs=1`;
    },
  },
  "post /api/grids/": { path: "/api/grids", attach: () => ["file", fakeGribBytes(`matrix-${++counter}`), "matrix.grib2"] },
  "get /api/grids/jobs": { path: "/api/grids/jobs" },
  "get /api/grids/jobs/:id": { path: "/api/grids/jobs/1" },
  "get /api/grids/runs": { path: "/api/grids/runs" },
  "get /api/grids/frames/:id": { path: "/api/grids/frames/1" },
  "get /api/grids/frames/:id/fields/:key": { path: "/api/grids/frames/1/fields/mlcape" },
  "get /api/grids/frames/:id/jet-streaks": { path: "/api/grids/frames/1/jet-streaks" },
  "get /api/grids/frames/:id/column": { path: "/api/grids/frames/1/column?lat=35&lon=-99" },
  "get /api/events/": { path: "/api/events", stream: true },
  "post /api/soundings/diagnose": { path: "/api/soundings/diagnose", body: () => ({ csv: SOUNDING }) },
  "post /api/soundings/report": { path: "/api/soundings/report", body: () => ({ csv: SOUNDING }) },
  "get /api/zones/": { path: "/api/zones" },
  "get /api/zones/:id": { path: "/api/zones/1" },
  "post /api/zones/": { path: "/api/zones", body: () => ({ code: `M${++counter}`, name: "Matrix zone", geometry: SQUARE }) },
  "post /api/zones/import": {
    path: "/api/zones/import",
    body: () => ({ type: "FeatureCollection", features: [{ type: "Feature", properties: { code: `I${++counter}`, name: "Imported" }, geometry: SQUARE }] }),
  },
  "patch /api/zones/:id": { path: "/api/zones/1", body: () => ({ name: `Renamed ${++counter}` }) },
  "get /api/rules/": { path: "/api/rules" },
  "post /api/rules/check": { path: "/api/rules/check", body: () => ({ expression: "mlcape >= 1000" }) },
  "post /api/rules/preview": { path: "/api/rules/preview", body: () => ({ expression: "shear_0_6km >= 10", zoneIds: [1] }) },
  "get /api/rules/:id": { path: "/api/rules/1" },
  "get /api/rules/:id/versions": { path: "/api/rules/1/versions" },
  "post /api/rules/": { path: "/api/rules", body: () => RULE({ name: `Matrix rule ${++counter}` }) },
  "put /api/rules/:id": { path: "/api/rules/1", body: () => ({ ...RULE({ description: `Edit ${++counter}` }), changeNote: "matrix" }) },
  "post /api/rules/:id/enabled": { path: "/api/rules/1/enabled", body: () => ({ enabled: false, changeNote: "matrix" }) },
  "delete /api/rules/:id": {
    path: "",
    prepare: async () => `/api/rules/${(await server.services.rules.create(SYSTEM_ACTOR, RULE({ name: `To delete ${++counter}` }) as never)).id}`,
  },
  "post /api/rules/:id/backtest": { path: "/api/rules/1/backtest", body: () => ({ runs: 2 }) },
  "get /api/triggers/": { path: "/api/triggers" },
  "get /api/triggers/:id": { path: "/api/triggers/1" },
  "get /api/triggers/:id/frames/:frameId/mask": { path: "/api/triggers/1/frames/1/mask" },
  "post /api/triggers/:id/acknowledge": { path: "", prepare: async () => `/api/triggers/${await insertOpenTrigger(server, 1, 1)}/acknowledge`, body: () => ({}) },
  "post /api/triggers/:id/comments": { path: "/api/triggers/1/comments", body: () => ({ text: "Matrix comment" }) },
  "post /api/triggers/:id/false-alarm": { path: "", prepare: async () => `/api/triggers/${await insertOpenTrigger(server, 1, 1)}/false-alarm`, body: () => ({ reason: "Matrix check" }) },
  "get /api/timeline/": { path: "/api/timeline" },
  "get /api/contacts/": { path: "/api/contacts" },
  "get /api/contacts/:id": { path: "/api/contacts/1" },
  "post /api/contacts/": { path: "/api/contacts", body: () => ({ name: `Matrix contact ${++counter}`, email: `matrix${counter}@example.test`, channels: ["email"] }) },
  "put /api/contacts/:id": { path: "/api/contacts/1", body: () => ({ name: `Matrix contact one ${++counter}`, email: "one@example.test", mobile: "+15550100101", channels: ["email", "sms"] }) },
  "delete /api/contacts/:id": { path: "", prepare: async () => `/api/contacts/${(await makeContact(server)).id}` },
  "get /api/contact-groups/": { path: "/api/contact-groups" },
  "post /api/contact-groups/": { path: "/api/contact-groups", body: () => ({ name: `Matrix group ${++counter}`, contactIds: [1] }) },
  "put /api/contact-groups/:id": { path: "/api/contact-groups/1", body: () => ({ name: `Matrix group one ${++counter}`, contactIds: [1] }) },
  "delete /api/contact-groups/:id": { path: "", prepare: async () => `/api/contact-groups/${(await makeGroup(server)).id}` },
  "get /api/on-call/": { path: "/api/on-call" },
  "get /api/on-call/now": { path: "/api/on-call/now" },
  "post /api/on-call/": { path: "/api/on-call", body: () => ({ contactId: 1, role: "lead", startsAt: "2030-01-01T00:00:00Z", endsAt: "2030-01-01T12:00:00Z" }) },
  "put /api/on-call/:id": { path: "/api/on-call/1", body: () => ({ contactId: 1, role: "forecaster", startsAt: "2020-01-01T00:00:00Z", endsAt: "2020-01-01T12:00:00Z", note: `Matrix ${++counter}` }) },
  "delete /api/on-call/:id": { path: "", prepare: async () => `/api/on-call/${(await makeShift(server, 1, "lead", new Date("2031-01-01T00:00:00Z"), new Date("2031-01-01T08:00:00Z"))).id}` },
  "get /api/notifications/": { path: "/api/notifications?triggerId=1" },
  "get /api/notifications/settings": { path: "/api/notifications/settings" },
  "put /api/notifications/settings": { path: "/api/notifications/settings", body: () => ({ templates: DEFAULT_TEMPLATES, escalationContactId: 1 }) },
  "get /api/notifications/:id": { path: "/api/notifications/1" },
  "post /api/notifications/:id/resend": { path: "", prepare: async () => `/api/notifications/${await insertNotification(server, 1, "failed")}/resend` },
  "get /api/fakes/": { path: "/api/fakes" },
  "get /api/fakes/mail": { path: "/api/fakes/mail" },
  "get /api/fakes/sms": { path: "/api/fakes/sms" },
  "get /api/fakes/mail/:id/attachments/:index": { path: "", prepare: async () => `/api/fakes/mail/${await deliverFakeMail(server)}/attachments/0` },
  "put /api/fakes/behaviour": { path: "/api/fakes/behaviour", body: () => ({ mail: { delayMs: 0 }, sms: { failureRate: 0 } }) },
  "delete /api/fakes/messages": { path: "/api/fakes/messages" },
  "delete /api/zones/:id": {
    path: "",
    // Each cell deletes a zone of its own, so zone 1 stays for the other cells.
    prepare: async () => `/api/zones/${(await server.services.zones.create(SYSTEM_ACTOR, { code: `D${++counter}`, name: "To delete", geometry: SQUARE as never })).id}`,
  },
};

const keyOf = (r: RouteEntry) => `${r.method} ${r.path}`;

function allowedRoles(route: RouteEntry): readonly Role[] {
  if (route.access === "public" || route.access === "signed-in") return ROLES;
  return PERMISSIONS[route.access];
}

async function call(who: SignedInAgent, method: HttpMethod, example: Example) {
  const path = example.prepare ? await example.prepare() : example.path;
  const req = who.agent[method](path).set("x-csrf-token", who.csrf);
  if (example.stream) {
    // Resolve on the first bytes of the stream (or the end of an error body), then hang up.
    return req.buffer(true).parse((res, done) => {
      let finished = false;
      const finish = () => {
        if (finished) return;
        finished = true;
        done(null, null);
        (res as unknown as { destroy(): void }).destroy();
      };
      res.once("data", finish);
      res.once("end", finish);
    });
  }
  if (example.attach) {
    const [field, content, name] = example.attach();
    return req.attach(field, content, name);
  }
  return example.body ? req.send(example.body() as object) : req;
}

let server: TestServer;
beforeAll(async () => {
  // Each upload names its own model, so later uploads never replace the seeded frame.
  server = await startTestServer({}, { decode: (bytes) => syntheticRecords({ model: Buffer.from(bytes).toString("latin1").slice(8) }) });
  // One ingested frame (id 1) so the frame routes have something to answer with.
  // Zone 1, rule 1, then frame 1, which opens trigger 1.
  await server.services.zones.create(SYSTEM_ACTOR, { code: "SEED", name: "Seed zone", geometry: SQUARE as never });
  await server.services.rules.create(SYSTEM_ACTOR, RULE() as never);
  await ingestBytes(server, fakeGribBytes("matrix-seed"), "seed.grib2");
  await server.services.evaluation.idle();
  // Contact 1, group 1, shift 1 and notification 1 for the notification routes.
  const contact = await makeContact(server);
  await makeGroup(server, [contact.id]);
  await makeShift(server, contact.id, "forecaster", new Date("2020-01-01T00:00:00Z"), new Date("2020-01-01T12:00:00Z"));
  await insertNotification(server, 1, "sent");
});
afterAll(async () => server.close());

describe("route × role matrix", () => {
  it("has an example for every registered route", () => {
    const missing = server.routes.map(keyOf).filter((k) => !(k in EXAMPLES));
    expect(missing).toEqual([]);
    expect(server.routes.length).toBe(Object.keys(EXAMPLES).length);
  });

  it("refuses every non-public route to a visitor who is not signed in (401)", async () => {
    for (const route of server.routes.filter((r) => r.access !== "public")) {
      const res = await call(await anonymous(server.app), route.method, EXAMPLES[keyOf(route)]!);
      expect(res.status, keyOf(route)).toBe(401);
    }
  });

  for (const role of ROLES) {
    it(`enforces the permission table for the ${role} role`, async () => {
      const shared = await signIn(server.app, DEMO_USER_FOR_ROLE[role]);
      for (const route of server.routes) {
        // Sign-in and sign-out replace the session, so they get a fresh one; other cells share one.
        const who = route.path.startsWith("/api/auth/log") ? await signIn(server.app, DEMO_USER_FOR_ROLE[role]) : shared;
        const res = await call(who, route.method, EXAMPLES[keyOf(route)]!);
        const expected = allowedRoles(route).some((r) => (DEMO_ROLES[role] as readonly Role[]).includes(r)) ? "2xx" : 403;
        if (expected === 403) expect(res.status, `${role} ${keyOf(route)}`).toBe(403);
        else expect([200, 201, 202, 204], `${role} ${keyOf(route)}: ${res.status} ${JSON.stringify(res.body)}`).toContain(res.status);
      }
    });
  }
});

/** Roles each demo account holds (lead is also a forecaster). */
const DEMO_ROLES: Record<Role, readonly Role[]> = { lead: ["lead", "forecaster"], forecaster: ["forecaster"], manager: ["manager"], admin: ["admin"] };
