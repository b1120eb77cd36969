import { describe, expect, it } from "vitest";
import { z } from "zod";
import { ApiError, createApiClient } from "../../../src/lib/api-client.ts";

describe("api client: multipart uploads and binary replies", () => {
  it("sends FormData as it is, with the CSRF header and no JSON content type", async () => {
    const sent: Array<{ url: string; headers: Record<string, string>; body: unknown }> = [];
    const fetchImpl = (async (input: RequestInfo | URL, init?: RequestInit) => {
      sent.push({ url: String(input), headers: { ...(init?.headers as Record<string, string>) }, body: init?.body });
      if (String(input).endsWith("/csrf")) return new Response(JSON.stringify({ token: "t-9" }), { status: 200 });
      return new Response(JSON.stringify({ ok: true }), { status: 202 });
    }) as typeof fetch;
    const client = createApiClient({ fetchImpl });
    const form = new FormData();
    form.append("file", new Blob([new Uint8Array([0x47, 0x52, 0x49, 0x42])]), "a.grib2");
    await expect(client.post("/api/grids", form, { schema: z.object({ ok: z.boolean() }) })).resolves.toEqual({ ok: true });
    const upload = sent[1]!;
    expect(upload.body).toBe(form);
    expect(upload.headers["x-csrf-token"]).toBe("t-9");
    expect(upload.headers["content-type"]).toBeUndefined();
  });

  it("returns binary bytes with their headers, and the usual ApiError on failure", async () => {
    const payload = new Uint8Array([1, 2, 3, 4]);
    let call = 0;
    const fetchImpl = (async () => {
      call++;
      if (call === 1) return new Response(payload, { status: 200, headers: { "x-grid-nx": "1", "x-grid-ny": "1" } });
      return new Response(JSON.stringify({ error: { code: "NOT_FOUND", message: "Field \"x\" of frame 3 was not found", requestId: "r7" } }), { status: 404 });
    }) as typeof fetch;
    const client = createApiClient({ fetchImpl });
    const reply = await client.getBytes("/api/grids/frames/3/fields/mlcape");
    expect([...new Uint8Array(reply.bytes)]).toEqual([1, 2, 3, 4]);
    expect(reply.headers.get("x-grid-nx")).toBe("1");
    const failure = await client.getBytes("/api/grids/frames/3/fields/x").catch((error: unknown) => error);
    expect(failure).toBeInstanceOf(ApiError);
    expect(failure).toMatchObject({ status: 404, code: "NOT_FOUND", requestId: "r7" });
  });
});
