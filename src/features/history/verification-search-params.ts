import { verificationQuery, type VerificationQuery } from "@shared/api/verification.ts";
import { STORM_REPORT_KINDS } from "@shared/storm-reports/storm-report-kinds.ts";

const DAY_MS = 86_400_000;

/**
 * The period shown when the URL names none: yesterday, today and tomorrow (UTC days). Reviews
 * usually look back a day; tomorrow is included so triggers of today's model runs, whose valid
 * times run into the evening, are scored with the reports that follow them.
 */
export function defaultPeriod(now: Date): { from: string; to: string } {
  const today = Date.UTC(now.getUTCFullYear(), now.getUTCMonth(), now.getUTCDate());
  return { from: new Date(today - DAY_MS).toISOString(), to: new Date(today + 2 * DAY_MS).toISOString() };
}

const KEYS = ["from", "to", "ruleId", "ruleVersionId", "space", "distanceKm", "windowHours", "kinds"] as const;

/** Reads the verification query from the URL, each parameter on its own; a bad one falls back to its default. */
export function verificationQueryFromSearch(params: URLSearchParams, now: Date): VerificationQuery {
  const raw: Record<string, unknown> = { ...defaultPeriod(now) };
  for (const key of KEYS) {
    const value = params.get(key);
    if (value !== null && value.trim() !== "") raw[key] = value;
  }
  const parsed = verificationQuery.safeParse(raw);
  if (parsed.success) return parsed.data;
  // Drop the parameters the schema named and try once more with the rest.
  const bad = new Set(parsed.error.issues.map((issue) => String(issue.path[0])));
  const kept = Object.fromEntries(Object.entries(raw).filter(([key]) => !bad.has(key)));
  const retry = verificationQuery.safeParse({ ...defaultPeriod(now), ...kept });
  return retry.success ? retry.data : verificationQuery.parse(defaultPeriod(now));
}

export function searchFromVerificationQuery(query: VerificationQuery): URLSearchParams {
  const params = new URLSearchParams({ from: query.from, to: query.to });
  if (query.ruleId) params.set("ruleId", String(query.ruleId));
  if (query.ruleVersionId) params.set("ruleVersionId", String(query.ruleVersionId));
  if (query.space !== "zone") params.set("space", query.space);
  if (query.distanceKm !== undefined) params.set("distanceKm", String(query.distanceKm));
  if (query.windowHours !== 1) params.set("windowHours", String(query.windowHours));
  if (query.kinds && query.kinds.length > 0 && query.kinds.length < STORM_REPORT_KINDS.length) params.set("kinds", query.kinds.join(","));
  return params;
}
