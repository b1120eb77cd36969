import { isApiError } from "./api-client.ts";

function issueList(details: unknown): unknown[] {
  if (Array.isArray(details)) return details;
  if (typeof details === "object" && details !== null && Array.isArray((details as { issues?: unknown }).issues)) {
    return (details as { issues: unknown[] }).issues;
  }
  return [];
}

/**
 * Pulls per-field messages out of a validation error's `details`: a list of issues, bare or under
 * `issues`, each naming its field as `field` or `path` ("a.b" or ["a","b"]) with a `message`.
 * Unknown shapes give an empty map, and the caller shows the general message instead.
 */
export function fieldErrorsFromApiError(error: unknown): Record<string, string> {
  if (!isApiError(error)) return {};
  const result: Record<string, string> = {};
  for (const issue of issueList(error.details)) {
    if (typeof issue !== "object" || issue === null) continue;
    const { field, path, message } = issue as { field?: unknown; path?: unknown; message?: unknown };
    if (typeof message !== "string") continue;
    const name = field ?? path;
    const key = Array.isArray(name) ? name.map(String).join(".") : typeof name === "string" ? name : "";
    if (key && !(key in result)) result[key] = message;
  }
  return result;
}
