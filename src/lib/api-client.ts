import type { z } from "zod";
import { apiErrorBody } from "@shared/api/errors.ts";
import { csrfTokenDto } from "@shared/api/auth.ts";

/** A failed API call: the HTTP status plus the server's stable error code and message. */
export class ApiError extends Error {
  readonly status: number;
  readonly code: string;
  readonly details: unknown;
  readonly requestId: string | undefined;

  constructor(init: { status: number; code: string; message: string; details?: unknown; requestId?: string }) {
    super(init.message);
    this.name = "ApiError";
    this.status = init.status;
    this.code = init.code;
    this.details = init.details;
    this.requestId = init.requestId;
  }
}

export function isApiError(error: unknown): error is ApiError {
  return error instanceof ApiError;
}

type Method = "GET" | "POST" | "PATCH" | "PUT" | "DELETE";
type QueryValue = string | number | boolean | null | undefined;

export interface RequestOptions<T> {
  method?: Method;
  /** Sent as JSON, except FormData, which goes as multipart (file uploads). */
  body?: unknown;
  /** Appended as a query string; null, undefined and "" are left out. */
  query?: Record<string, QueryValue>;
  /** When given, the JSON reply must match it; a mismatch becomes an ApiError. */
  schema?: z.ZodType<T>;
  signal?: AbortSignal;
}

export interface ApiClientOptions {
  /** Injected so tests can stand in for the network. Defaults to the global fetch. */
  fetchImpl?: typeof fetch;
  baseUrl?: string;
}

const CSRF_PATH = "/api/auth/csrf";
const UNSAFE_METHODS: ReadonlySet<Method> = new Set(["POST", "PATCH", "PUT", "DELETE"]);

export function buildUrl(baseUrl: string, path: string, query?: Record<string, QueryValue>): string {
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(query ?? {})) {
    if (value === undefined || value === null || value === "") continue;
    params.append(key, String(value));
  }
  const search = params.toString();
  return `${baseUrl}${path}${search ? `?${search}` : ""}`;
}

async function readJson(response: Response): Promise<unknown> {
  const text = await response.text();
  if (text.length === 0) return undefined;
  try {
    return JSON.parse(text);
  } catch {
    return text;
  }
}

/** Turns any failed reply into an ApiError, keeping the server's code when the body has the usual shape. */
export function errorFromResponse(status: number, statusText: string, body: unknown): ApiError {
  const parsed = apiErrorBody.safeParse(body);
  if (parsed.success) {
    const { code, message, details, requestId } = parsed.data.error;
    return new ApiError({ status, code, message, details, requestId });
  }
  const fallback = statusText ? `${status} ${statusText}` : `status ${status}`;
  return new ApiError({ status, code: `HTTP_${status}`, message: `The server answered ${fallback}` });
}

function describeIssues(issues: readonly z.core.$ZodIssue[]): string {
  return issues
    .slice(0, 3)
    .map((issue) => `${issue.path.length ? issue.path.join(".") : "(root)"}: ${issue.message}`)
    .join("; ");
}

/**
 * A small JSON client for Bellwether's API: same-origin cookies, the CSRF header on every
 * state-changing call (fetched once, refetched once when the server says it is stale), and one
 * error type for every failure so screens need only one way to show it.
 */
export function createApiClient(options: ApiClientOptions = {}) {
  const baseUrl = options.baseUrl ?? "";
  const doFetch: typeof fetch = (input, init) => (options.fetchImpl ?? globalThis.fetch)(input, init);
  let csrfToken: Promise<string> | null = null;

  async function send(url: string, init: RequestInit): Promise<Response> {
    try {
      return await doFetch(url, init);
    } catch (cause) {
      if (init.signal?.aborted) throw cause;
      throw new ApiError({ status: 0, code: "NETWORK", message: "Could not reach the Bellwether server" });
    }
  }

  async function fetchCsrfToken(): Promise<string> {
    const response = await send(`${baseUrl}${CSRF_PATH}`, {
      method: "GET",
      credentials: "same-origin",
      headers: { accept: "application/json" },
    });
    const body = await readJson(response);
    if (!response.ok) throw errorFromResponse(response.status, response.statusText, body);
    const parsed = csrfTokenDto.safeParse(body);
    if (!parsed.success) {
      throw new ApiError({ status: response.status, code: "INVALID_RESPONSE", message: "The CSRF token reply had no token" });
    }
    return parsed.data.token;
  }

  function csrf(): Promise<string> {
    csrfToken ??= fetchCsrfToken().catch((error: unknown) => {
      csrfToken = null;
      throw error;
    });
    return csrfToken;
  }

  async function request<T = unknown>(path: string, opts: RequestOptions<T> = {}): Promise<T> {
    const method = opts.method ?? "GET";
    const url = buildUrl(baseUrl, path, opts.query);

    const multipart = typeof FormData !== "undefined" && opts.body instanceof FormData;
    async function attempt(): Promise<Response> {
      const headers: Record<string, string> = { accept: "application/json" };
      // The browser writes the multipart content type itself, boundary included.
      if (opts.body !== undefined && !multipart) headers["content-type"] = "application/json";
      if (UNSAFE_METHODS.has(method)) headers["x-csrf-token"] = await csrf();
      return send(url, {
        method,
        headers,
        credentials: "same-origin",
        body: opts.body === undefined ? undefined : multipart ? (opts.body as FormData) : JSON.stringify(opts.body),
        signal: opts.signal,
      });
    }

    let response = await attempt();
    let body = await readJson(response);
    if (response.status === 403 && UNSAFE_METHODS.has(method)) {
      const error = errorFromResponse(response.status, response.statusText, body);
      if (error.code === "CSRF_INVALID") {
        // The token is tied to the session, which changes at sign-in and sign-out: fetch a fresh one once.
        csrfToken = null;
        response = await attempt();
        body = await readJson(response);
      }
    }
    if (!response.ok) throw errorFromResponse(response.status, response.statusText, body);
    if (!opts.schema) return body as T;

    const parsed = opts.schema.safeParse(body);
    if (!parsed.success) {
      throw new ApiError({
        status: response.status,
        code: "INVALID_RESPONSE",
        message: `The reply to ${method} ${path} did not have the expected shape (${describeIssues(parsed.error.issues)})`,
        details: parsed.error.issues,
      });
    }
    return parsed.data;
  }

  /** A GET whose reply is binary (grid fields): the bytes and the reply's headers. Failures are ApiErrors as usual. */
  async function getBytes(path: string, opts: { query?: Record<string, QueryValue>; signal?: AbortSignal } = {}): Promise<BinaryReply> {
    const response = await send(buildUrl(baseUrl, path, opts.query), {
      method: "GET",
      headers: { accept: "application/octet-stream" },
      credentials: "same-origin",
      signal: opts.signal,
    });
    if (!response.ok) throw errorFromResponse(response.status, response.statusText, await readJson(response));
    return { bytes: await response.arrayBuffer(), headers: response.headers };
  }

  return {
    request,
    getBytes,
    get: <T>(path: string, opts: Omit<RequestOptions<T>, "method" | "body"> = {}) => request<T>(path, { ...opts, method: "GET" }),
    post: <T>(path: string, body?: unknown, opts: Omit<RequestOptions<T>, "method" | "body"> = {}) =>
      request<T>(path, { ...opts, method: "POST", body }),
    patch: <T>(path: string, body?: unknown, opts: Omit<RequestOptions<T>, "method" | "body"> = {}) =>
      request<T>(path, { ...opts, method: "PATCH", body }),
    put: <T>(path: string, body?: unknown, opts: Omit<RequestOptions<T>, "method" | "body"> = {}) =>
      request<T>(path, { ...opts, method: "PUT", body }),
    delete: <T>(path: string, opts: Omit<RequestOptions<T>, "method" | "body"> = {}) => request<T>(path, { ...opts, method: "DELETE" }),
    /** Forget the CSRF token; call after sign-in and sign-out, when the session changes. */
    resetCsrfToken: () => {
      csrfToken = null;
    },
  };
}

export interface BinaryReply {
  bytes: ArrayBuffer;
  headers: Headers;
}

export type ApiClient = ReturnType<typeof createApiClient>;

/** The client the app uses. */
export const api: ApiClient = createApiClient();
