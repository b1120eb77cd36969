import { afterAll, beforeAll, describe, expect, it } from "vitest";
import request from "supertest";
import { startTestServer, signIn, TEST_PASSWORD, type TestServer } from "../helpers/test-server.ts";
import { UserEntity } from "../../server/entities/user.entity.ts";
import { SessionEntity } from "../../server/entities/session.entity.ts";

let server: TestServer;
beforeAll(async () => {
  server = await startTestServer();
});
afterAll(async () => server.close());

const sessionCookie = (res: request.Response): string | undefined =>
  ([] as string[]).concat(res.headers["set-cookie"] ?? []).find((c) => c.startsWith("bellwether.sid="));

describe("health and errors", () => {
  it("answers health without sign-in", async () => {
    const res = await request(server.app).get("/api/health");
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ status: "ok" });
  });

  it("answers unknown API routes with the JSON error shape", async () => {
    const res = await request(server.app).get("/api/no-such-thing");
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe("NOT_FOUND");
    expect(typeof res.body.error.requestId).toBe("string");
  });

  it("sends security headers", async () => {
    const res = await request(server.app).get("/api/health");
    expect(res.headers["content-security-policy"]).toContain("default-src 'self'");
    expect(res.headers["x-content-type-options"]).toBe("nosniff");
  });

  it("refuses malformed JSON with a 400 and no stack trace", async () => {
    const res = await request(server.app).post("/api/auth/login").set("content-type", "application/json").send('{"username": ');
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe("MALFORMED_JSON");
    expect(JSON.stringify(res.body)).not.toMatch(/at .*\.ts:\d+/);
  });
});

describe("sign-in", () => {
  it("signs in with JSON, sets an httpOnly SameSite session cookie and returns the user", async () => {
    const res = await request(server.app).post("/api/auth/login").send({ username: "lead", password: TEST_PASSWORD });
    expect(res.status).toBe(200);
    expect(res.body.user).toMatchObject({ username: "lead", roles: ["lead", "forecaster"] });
    const cookie = sessionCookie(res);
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Lax/i);
    expect(res.body.user).not.toHaveProperty("passwordHash");
  });

  it("gives one generic error for an unknown user and a wrong password", async () => {
    const unknown = await request(server.app).post("/api/auth/login").send({ username: "nobody", password: "whatever-123" });
    const wrong = await request(server.app).post("/api/auth/login").send({ username: "lead", password: "wrong-password" });
    expect(unknown.status).toBe(401);
    expect(wrong.status).toBe(401);
    expect(unknown.body.error).toMatchObject({ code: "BAD_CREDENTIALS" });
    expect(wrong.body.error.message).toBe(unknown.body.error.message);
  });

  it("names missing fields when the body is incomplete", async () => {
    const res = await request(server.app).post("/api/auth/login").send({ username: "lead" });
    expect(res.status).toBe(400);
    expect(res.body.error.message).toContain("password");
  });

  it("regenerates the session id at sign-in", async () => {
    const agent = request.agent(server.app);
    const before = sessionCookie(await agent.get("/api/auth/csrf"));
    const after = sessionCookie(await agent.post("/api/auth/login").send({ username: "forecaster", password: TEST_PASSWORD }));
    expect(before).toBeDefined();
    expect(after).toBeDefined();
    expect(after!.split(";")[0]).not.toBe(before!.split(";")[0]);
  });

  it("keeps sessions in the SQLite store, not in memory", async () => {
    await signIn(server.app, "manager");
    const rows = await server.dataSource.getRepository(SessionEntity).count();
    expect(rows).toBeGreaterThan(0);
  });

  it("stores passwords as bcrypt hashes of cost 12 or more", async () => {
    const user = await server.dataSource.getRepository(UserEntity).findOneByOrFail({ username: "admin" });
    const cost = Number(user.passwordHash.split("$")[2]);
    expect(user.passwordHash).toMatch(/^\$2[aby]\$/);
    expect(cost).toBeGreaterThanOrEqual(12);
  });

  it("reports the signed-in user at /api/auth/me and 401 after sign-out", async () => {
    const { agent, csrf } = await signIn(server.app, "admin");
    expect((await agent.get("/api/auth/me")).body.user.username).toBe("admin");
    expect((await agent.post("/api/auth/logout").set("x-csrf-token", csrf)).status).toBe(204);
    const me = await agent.get("/api/auth/me");
    expect(me.status).toBe(401);
    expect(me.body.error.code).toBe("UNAUTHENTICATED");
  });

  it("refuses sign-in as a form post (JSON only)", async () => {
    const res = await request(server.app).post("/api/auth/login").type("form").send({ username: "lead", password: TEST_PASSWORD });
    expect(res.status).toBe(415);
  });
});

describe("CSRF", () => {
  it("refuses a state-changing request without the token and accepts it with the token", async () => {
    const { agent, csrf } = await signIn(server.app, "admin");
    const without = await agent.post("/api/users").send({ username: "csrf-probe", displayName: "Probe", password: "long-enough-pw", roles: ["forecaster"] });
    expect(without.status).toBe(403);
    expect(without.body.error.code).toBe("CSRF_INVALID");
    const withToken = await agent
      .post("/api/users")
      .set("x-csrf-token", csrf)
      .send({ username: "csrf-probe", displayName: "Probe", password: "long-enough-pw", roles: ["forecaster"] });
    expect(withToken.status).toBe(201);
  });

  it("refuses a token that belongs to another session", async () => {
    const a = await signIn(server.app, "admin");
    const b = await signIn(server.app, "admin");
    const res = await a.agent.patch("/api/users/1").set("x-csrf-token", b.csrf).send({ displayName: "x" });
    expect(res.status).toBe(403);
  });
});

describe("rate limiting", () => {
  it("answers 429 after too many sign-in attempts for one username", async () => {
    const limited = await startTestServer({ LOGIN_RATE_LIMIT: "3" });
    try {
      const statuses: number[] = [];
      for (let i = 0; i < 5; i++) {
        statuses.push((await request(limited.app).post("/api/auth/login").send({ username: "lead", password: "wrong-password" })).status);
      }
      expect(statuses.slice(0, 3)).toEqual([401, 401, 401]);
      expect(statuses[4]).toBe(429);
      // Another username from the same address is not locked out.
      const other = await request(limited.app).post("/api/auth/login").send({ username: "manager", password: TEST_PASSWORD });
      expect(other.status).toBe(200);
    } finally {
      await limited.close();
    }
  });
});
