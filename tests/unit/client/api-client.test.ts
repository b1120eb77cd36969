import { describe, expect, it } from "vitest";
import { z } from "zod";
import { ApiError, buildUrl, createApiClient, errorFromResponse } from "../../../src/lib/api-client.ts";

interface Call {
  url: string;
  method: string;
  headers: Record<string, string>;
  body: string | undefined;
  credentials: RequestCredentials | undefined;
}

/** A scripted stand-in for fetch: answers in order and records what was sent. */
function scriptedFetch(replies: Array<{ status: number; body?: unknown; statusText?: string }>) {
  const calls: Call[] = [];
  const queue = [...replies];
  const fetchImpl = (async (input: RequestInfo | URL, init?: RequestInit) => {
    calls.push({
      url: String(input),
      method: init?.method ?? "GET",
      headers: { ...(init?.headers as Record<string, string>) },
      body: init?.body as string | undefined,
      credentials: init?.credentials,
    });
    const reply = queue.shift();
    if (!reply) throw new Error(`Unexpected request to ${String(input)}`);
    const text = reply.body === undefined ? null : typeof reply.body === "string" ? reply.body : JSON.stringify(reply.body);
    return new Response(text, { status: reply.status, statusText: reply.statusText ?? "" });
  }) as typeof fetch;
  return { fetchImpl, calls };
}

describe("createApiClient", () => {
  it("sends GETs without a CSRF token and returns the parsed JSON", async () => {
    const { fetchImpl, calls } = scriptedFetch([{ status: 200, body: { status: "ok" } }]);
    const client = createApiClient({ fetchImpl });
    await expect(client.get("/api/health")).resolves.toEqual({ status: "ok" });
    expect(calls).toHaveLength(1);
    expect(calls[0]!.headers["x-csrf-token"]).toBeUndefined();
    expect(calls[0]!.credentials).toBe("same-origin");
  });

  it("fetches the CSRF token once and sends it on every state-changing call", async () => {
    const { fetchImpl, calls } = scriptedFetch([
      { status: 200, body: { token: "t-1" } },
      { status: 200, body: { user: 1 } },
      { status: 204 },
    ]);
    const client = createApiClient({ fetchImpl });
    await client.post("/api/users", { username: "wren" });
    await expect(client.post("/api/auth/logout")).resolves.toBeUndefined();
    expect(calls.map((c) => `${c.method} ${c.url}`)).toEqual(["GET /api/auth/csrf", "POST /api/users", "POST /api/auth/logout"]);
    expect(calls[1]!.headers["x-csrf-token"]).toBe("t-1");
    expect(calls[1]!.headers["content-type"]).toBe("application/json");
    expect(JSON.parse(calls[1]!.body!)).toEqual({ username: "wren" });
    expect(calls[2]!.headers["x-csrf-token"]).toBe("t-1");
    // No body, so no JSON content type.
    expect(calls[2]!.headers["content-type"]).toBeUndefined();
  });

  it("refetches the token once and retries when the server reports CSRF_INVALID", async () => {
    const stale = { error: { code: "CSRF_INVALID", message: "Stale token", requestId: "r1" } };
    const { fetchImpl, calls } = scriptedFetch([
      { status: 200, body: { token: "old" } },
      { status: 403, body: stale },
      { status: 200, body: { token: "new" } },
      { status: 200, body: { ok: true } },
    ]);
    const client = createApiClient({ fetchImpl });
    await expect(client.patch("/api/users/3", { disabled: true })).resolves.toEqual({ ok: true });
    expect(calls.map((c) => c.headers["x-csrf-token"] ?? "-")).toEqual(["-", "old", "-", "new"]);
  });

  it("gives up after one retry when the fresh token is refused too", async () => {
    const stale = { error: { code: "CSRF_INVALID", message: "Stale token" } };
    const { fetchImpl, calls } = scriptedFetch([
      { status: 200, body: { token: "a" } },
      { status: 403, body: stale },
      { status: 200, body: { token: "b" } },
      { status: 403, body: stale },
    ]);
    const client = createApiClient({ fetchImpl });
    await expect(client.post("/api/users", {})).rejects.toMatchObject({ status: 403, code: "CSRF_INVALID" });
    expect(calls).toHaveLength(4);
  });

  it("does not retry a 403 that is about permissions", async () => {
    const { fetchImpl, calls } = scriptedFetch([
      { status: 200, body: { token: "a" } },
      { status: 403, body: { error: { code: "FORBIDDEN", message: "Not for your roles" } } },
    ]);
    const client = createApiClient({ fetchImpl });
    await expect(client.post("/api/users", {})).rejects.toMatchObject({ status: 403, code: "FORBIDDEN" });
    expect(calls).toHaveLength(2);
  });

  it("turns the error body into an ApiError with status, code, message, details and request id", async () => {
    const body = { error: { code: "VALIDATION", message: "Invalid body: username", details: { issues: [] }, requestId: "req-9" } };
    const { fetchImpl } = scriptedFetch([{ status: 400, body }]);
    const client = createApiClient({ fetchImpl });
    const error = await client.get("/api/audit").catch((e: unknown) => e);
    expect(error).toBeInstanceOf(ApiError);
    expect(error).toMatchObject({ status: 400, code: "VALIDATION", message: "Invalid body: username", details: { issues: [] }, requestId: "req-9" });
  });

  it("names the status when the error body is not JSON", async () => {
    const { fetchImpl } = scriptedFetch([{ status: 502, body: "<html>Bad gateway</html>", statusText: "Bad Gateway" }]);
    const client = createApiClient({ fetchImpl });
    await expect(client.get("/api/users")).rejects.toMatchObject({ status: 502, code: "HTTP_502", message: "The server answered 502 Bad Gateway" });
  });

  it("validates the reply against the schema and reports the mismatching path", async () => {
    const schema = z.object({ users: z.array(z.object({ id: z.number() })) });
    const { fetchImpl } = scriptedFetch([{ status: 200, body: { users: [{ id: "seven" }] } }]);
    const client = createApiClient({ fetchImpl });
    const error = (await client.get("/api/users", { schema }).catch((e: unknown) => e)) as ApiError;
    expect(error.code).toBe("INVALID_RESPONSE");
    expect(error.message).toContain("GET /api/users");
    expect(error.message).toContain("users.0.id");
  });

  it("reports an unreachable server as a NETWORK error", async () => {
    const fetchImpl = (async () => {
      throw new TypeError("fetch failed");
    }) as typeof fetch;
    const client = createApiClient({ fetchImpl });
    await expect(client.get("/api/health")).rejects.toMatchObject({ status: 0, code: "NETWORK" });
  });

  it("forgets the token after resetCsrfToken", async () => {
    const { fetchImpl, calls } = scriptedFetch([
      { status: 200, body: { token: "first" } },
      { status: 204 },
      { status: 200, body: { token: "second" } },
      { status: 204 },
    ]);
    const client = createApiClient({ fetchImpl });
    await client.post("/api/auth/logout");
    client.resetCsrfToken();
    await client.post("/api/auth/logout");
    expect(calls.map((c) => c.headers["x-csrf-token"] ?? "-")).toEqual(["-", "first", "-", "second"]);
  });
});

describe("buildUrl", () => {
  it("leaves out empty values and encodes the rest", () => {
    expect(buildUrl("", "/api/audit", { page: 2, action: "user.", actor: "", targetType: undefined, from: null })).toBe(
      "/api/audit?page=2&action=user.",
    );
    expect(buildUrl("", "/api/audit", { from: "2025-05-02T18:00:00.000Z" })).toBe("/api/audit?from=2025-05-02T18%3A00%3A00.000Z");
    expect(buildUrl("", "/api/health")).toBe("/api/health");
  });
});

describe("errorFromResponse", () => {
  it("keeps the server's code when the body has the shared error shape", () => {
    const error = errorFromResponse(429, "Too Many Requests", { error: { code: "RATE_LIMITED", message: "Slow down" } });
    expect(error).toMatchObject({ status: 429, code: "RATE_LIMITED", message: "Slow down" });
  });
});
