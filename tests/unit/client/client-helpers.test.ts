import { describe, expect, it } from "vitest";
import { ApiError } from "../../../src/lib/api-client.ts";
import { describeError } from "../../../src/lib/describe-error.ts";
import { fieldErrorsFromApiError } from "../../../src/lib/form-errors.ts";
import { formatCount, formatWindKnots, knotsFromMetersPerSecond } from "../../../src/lib/format-units.ts";
import { pageCount, pageRange } from "../../../src/lib/paging.ts";
import { isUnauthenticated, shouldRetry } from "../../../src/lib/query-client.ts";
import { DEFAULT_THEME, readStoredTheme, THEME_STORAGE_KEY } from "../../../src/lib/theme.tsx";
import { signInFailureMessage } from "../../../src/features/auth/components/sign-in-form.tsx";

const apiError = (status: number, code = `HTTP_${status}`, details?: unknown) =>
  new ApiError({ status, code, message: `server says ${code}`, details, requestId: "req-1" });

describe("display units", () => {
  it("converts m/s to knots", () => {
    // Source: BIPM SI Brochure, 9th ed. (2019), Table 8: 1 nautical mile = 1852 m, so 1 kt = 1852/3600 m/s.
    expect(knotsFromMetersPerSecond(1852 / 3600)).toBeCloseTo(1, 12);
    // Derived in closed form: 20 m/s × 3600/1852 = 38.877 kt.
    expect(knotsFromMetersPerSecond(20)).toBeCloseTo(38.877, 3);
    expect(formatWindKnots(20)).toBe("39 kt");
    expect(formatWindKnots(Number.NaN)).toBe("—");
  });

  it("agrees the noun with the count", () => {
    expect(formatCount(1, "entry", "entries")).toBe("1 entry");
    expect(formatCount(2310, "entry", "entries")).toBe("2,310 entries");
    expect(formatCount(0, "account")).toBe("0 accounts");
  });
});

describe("paging", () => {
  it("gives the 1-based range on a page", () => {
    expect(pageRange(2, 50, 234)).toEqual({ first: 51, last: 100 });
    expect(pageRange(5, 50, 234)).toEqual({ first: 201, last: 234 });
  });

  it("is null past the end or for an empty list", () => {
    expect(pageRange(6, 50, 234)).toBeNull();
    expect(pageRange(1, 50, 0)).toBeNull();
  });

  it("counts pages, with at least one", () => {
    expect(pageCount(50, 234)).toBe(5);
    expect(pageCount(50, 0)).toBe(1);
  });
});

describe("query retry policy", () => {
  it("never retries client errors, and retries network and server faults twice", () => {
    expect(shouldRetry(0, apiError(401))).toBe(false);
    expect(shouldRetry(0, apiError(404))).toBe(false);
    expect(shouldRetry(0, apiError(503))).toBe(true);
    expect(shouldRetry(1, apiError(0, "NETWORK"))).toBe(true);
    expect(shouldRetry(2, apiError(503))).toBe(false);
  });

  it("recognises a lost session", () => {
    expect(isUnauthenticated(apiError(401))).toBe(true);
    expect(isUnauthenticated(apiError(403))).toBe(false);
    expect(isUnauthenticated(new Error("401"))).toBe(false);
  });
});

describe("error wording", () => {
  it("keeps sign-in failures generic and explains rate limiting", () => {
    expect(signInFailureMessage(apiError(401, "BAD_CREDENTIALS"))).toBe("Username or password not recognised.");
    expect(signInFailureMessage(apiError(429, "RATE_LIMITED"))).toMatch(/Too many sign-in attempts/);
  });

  it("hides server internals behind a plain sentence but keeps the request id", () => {
    expect(describeError(apiError(500, "INTERNAL"))).toEqual({
      message: "The server ran into a problem. Try again; if it keeps happening, tell an administrator.",
      reference: "req-1",
    });
    expect(describeError(apiError(409, "CONFLICT")).message).toBe("server says CONFLICT");
  });

  it("maps server validation issues onto form fields", () => {
    const details = { part: "body", issues: [{ field: "username", message: "Taken" }, { field: "username", message: "second" }, { field: "roles.0", message: "Bad role" }] };
    expect(fieldErrorsFromApiError(apiError(400, "VALIDATION", details))).toEqual({ username: "Taken", "roles.0": "Bad role" });
    expect(fieldErrorsFromApiError(apiError(400, "VALIDATION", [{ path: ["displayName"], message: "Empty" }]))).toEqual({ displayName: "Empty" });
    expect(fieldErrorsFromApiError(apiError(400, "VALIDATION", "nonsense"))).toEqual({});
  });
});

describe("remembered theme", () => {
  const store = (value: string | null) => ({ getItem: (key: string) => (key === THEME_STORAGE_KEY ? value : null), setItem: () => {} });

  it("is dark unless light was chosen", () => {
    expect(DEFAULT_THEME).toBe("dark");
    expect(readStoredTheme(store(null))).toBe("dark");
    expect(readStoredTheme(store("light"))).toBe("light");
    expect(readStoredTheme(store("purple"))).toBe("dark");
    expect(readStoredTheme(undefined)).toBe("dark");
  });

  it("falls back to dark when storage throws", () => {
    const broken = { getItem: () => { throw new Error("denied"); }, setItem: () => {} };
    expect(readStoredTheme(broken)).toBe("dark");
  });
});
