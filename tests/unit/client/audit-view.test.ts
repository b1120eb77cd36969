import { describe, expect, it } from "vitest";
import { auditQueryFromSearch, filtersOf, searchFromAuditQuery, withFilters } from "../../../src/features/audit/audit-search-params.ts";
import { changedTopLevelKeys, formatSnapshot } from "../../../src/features/audit/json-changes.ts";

describe("audit query in the URL", () => {
  it("reads defaults from an empty URL (defaults come from shared/api/audit.ts)", () => {
    expect(auditQueryFromSearch(new URLSearchParams())).toEqual({ page: 1, pageSize: 50 });
  });

  it("reads filters and paging", () => {
    const query = auditQueryFromSearch(new URLSearchParams("page=3&pageSize=25&action=user.&actor=admin&from=2025-05-02T18:00:00.000Z"));
    expect(query).toEqual({ page: 3, pageSize: 25, action: "user.", actor: "admin", from: "2025-05-02T18:00:00.000Z" });
  });

  it("drops only the bad parameter when one is malformed", () => {
    const query = auditQueryFromSearch(new URLSearchParams("page=abc&pageSize=9999&actor=admin&to=yesterday"));
    expect(query).toEqual({ page: 1, pageSize: 50, actor: "admin" });
  });

  it("writes only non-default values back, and reads them again unchanged", () => {
    const query = { page: 2, pageSize: 50, targetType: "user" };
    const params = searchFromAuditQuery(query);
    expect(params.toString()).toBe("targetType=user&page=2");
    expect(auditQueryFromSearch(params)).toEqual(query);
  });

  it("starts new filters on page 1, keeps the page size and trims blanks away", () => {
    const next = withFilters({ page: 4, pageSize: 100, actor: "old" }, { action: " auth. ", actor: "", targetType: undefined });
    expect(next).toEqual({ page: 1, pageSize: 100, action: "auth." });
    expect(filtersOf(next)).toEqual({ action: "auth." });
  });
});

describe("changedTopLevelKeys", () => {
  it("names the keys an edit touched, in order", () => {
    const before = { username: "wren", roles: ["forecaster"], disabled: false };
    const after = { username: "wren", roles: ["forecaster", "lead"], disabled: true };
    expect(changedTopLevelKeys(before, after)).toEqual(["disabled", "roles"]);
  });

  it("counts keys present on one side only", () => {
    expect(changedTopLevelKeys({ a: 1 }, { a: 1, b: 2 })).toEqual(["b"]);
  });

  it("is empty for creations, deletions and non-object snapshots", () => {
    expect(changedTopLevelKeys(null, { a: 1 })).toEqual([]);
    expect(changedTopLevelKeys({ a: 1 }, null)).toEqual([]);
    expect(changedTopLevelKeys([1], [2])).toEqual([]);
  });

  it("pretty-prints snapshots and marks a missing one", () => {
    expect(formatSnapshot({ a: 1 })).toBe('{\n  "a": 1\n}');
    expect(formatSnapshot(null)).toBe("—");
  });
});
