import { isApiError } from "./api-client.ts";

const isRecord = (value: unknown): value is Record<string, unknown> => typeof value === "object" && value !== null;

/** A validation path as people read it: "features.2.properties.code" → "feature 3, properties.code". */
function readablePath(path: string): string {
  return path.replace(/^features\.(\d+)\.?/, (_, index: string) => `feature ${Number(index) + 1}${path.length > `features.${index}`.length ? ", " : ""}`);
}

/**
 * Every reason the server gave for refusing a request, as plain lines: `details.problems` (zone
 * geometry checks), `details.issues` (schema checks, each with its field) and `details.errors`
 * (expression checks). Falls back to the error's own message, so there is always at least one line.
 */
export function refusalProblems(error: unknown): string[] {
  const lines: string[] = [];
  if (isApiError(error) && isRecord(error.details)) {
    const { problems, issues, errors } = error.details;
    if (Array.isArray(problems)) for (const p of problems) if (typeof p === "string") lines.push(p);
    if (Array.isArray(issues)) {
      for (const issue of issues) {
        if (!isRecord(issue) || typeof issue.message !== "string") continue;
        const field = typeof issue.field === "string" && issue.field !== "body" ? readablePath(issue.field) : "";
        lines.push(field ? `${field}: ${issue.message}` : issue.message);
      }
    }
    if (Array.isArray(errors)) for (const e of errors) if (isRecord(e) && typeof e.message === "string") lines.push(e.message);
  }
  if (lines.length === 0) lines.push(error instanceof Error && error.message ? error.message : "The request was refused.");
  return [...new Set(lines)];
}
