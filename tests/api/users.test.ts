import { afterAll, beforeAll, describe, expect, it } from "vitest";
import request from "supertest";
import { startTestServer, signIn, type SignedInAgent, type TestServer } from "../helpers/test-server.ts";

let server: TestServer;
let admin: SignedInAgent;
beforeAll(async () => {
  server = await startTestServer();
  admin = await signIn(server.app, "admin");
});
afterAll(async () => server.close());

const post = (path: string, body: object) => admin.agent.post(path).set("x-csrf-token", admin.csrf).send(body);
const patch = (path: string, body: object) => admin.agent.patch(path).set("x-csrf-token", admin.csrf).send(body);

describe("accounts administration", () => {
  it("lists the demo accounts with their roles", async () => {
    const res = await admin.agent.get("/api/users");
    const byName = Object.fromEntries(res.body.users.map((u: { username: string; roles: string[] }) => [u.username, u.roles]));
    expect(byName).toMatchObject({ lead: ["lead", "forecaster"], forecaster: ["forecaster"], manager: ["manager"], admin: ["admin"] });
  });

  it("creates an account that can sign in, edits its roles, disables and re-enables it", async () => {
    const created = await post("/api/users", { username: "night-desk", displayName: "Night desk", password: "night-desk-pw-1", roles: ["forecaster"] });
    expect(created.status).toBe(201);
    const id = created.body.user.id;
    await signIn(server.app, "night-desk", "night-desk-pw-1");

    const edited = await patch(`/api/users/${id}`, { roles: ["forecaster", "lead"] });
    expect(edited.body.user.roles).toEqual(["forecaster", "lead"]);

    expect((await patch(`/api/users/${id}`, { disabled: true })).body.user.disabled).toBe(true);
    const refused = await request(server.app).post("/api/auth/login").send({ username: "night-desk", password: "night-desk-pw-1" });
    expect(refused.status).toBe(403);
    expect(refused.body.error.code).toBe("ACCOUNT_DISABLED");

    await patch(`/api/users/${id}`, { disabled: false });
    const reset = await post(`/api/users/${id}/password`, { password: "fresh-password-2" });
    expect(reset.status).toBe(204);
    await signIn(server.app, "night-desk", "fresh-password-2");
  });

  it("ends the access of a disabled account that is already signed in", async () => {
    const created = await post("/api/users", { username: "day-desk", displayName: "Day desk", password: "day-desk-pw-12", roles: ["forecaster"] });
    const session = await signIn(server.app, "day-desk", "day-desk-pw-12");
    expect((await session.agent.get("/api/auth/me")).status).toBe(200);
    await patch(`/api/users/${created.body.user.id}`, { disabled: true });
    expect((await session.agent.get("/api/auth/me")).status).toBe(401);
  });

  it("refuses a duplicate username with 409", async () => {
    const res = await post("/api/users", { username: "lead", displayName: "Again", password: "another-pw-123", roles: ["lead"] });
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe("CONFLICT");
  });

  it("names the field that is wrong", async () => {
    const res = await post("/api/users", { username: "Bad Name!", displayName: "x", password: "short", roles: [] });
    expect(res.status).toBe(400);
    const fields = res.body.error.details.issues.map((i: { field: string }) => i.field);
    expect(fields).toEqual(expect.arrayContaining(["username", "password", "roles"]));
    const role = await post("/api/users", { username: "ok-name", displayName: "x", password: "long-enough-1", roles: ["wizard"] });
    expect(role.status).toBe(400);
    expect(role.body.error.message).toContain("roles");
  });

  it("will not let the last administrator be disabled or lose the role", async () => {
    const users = (await admin.agent.get("/api/users")).body.users as Array<{ id: number; username: string }>;
    const self = users.find((u) => u.username === "admin")!;
    const res = await patch(`/api/users/${self.id}`, { roles: ["manager"] });
    expect(res.status).toBe(400);
    expect((await admin.agent.get("/api/auth/me")).body.user.roles).toEqual(["admin"]);
  });

  it("answers 404 for an unknown account", async () => {
    const res = await patch("/api/users/9999", { displayName: "Ghost" });
    expect(res.status).toBe(404);
  });
});
