/**
 * The messages of a nested part of a react-hook-form error tree, one level deep
 * ({ percent: { message } } → { percent: "…" }), plus the part's own message under "".
 */
export function nestedMessages(error: unknown): Record<string, string> {
  const out: Record<string, string> = {};
  if (typeof error !== "object" || error === null) return out;
  const own = (error as { message?: unknown }).message;
  if (typeof own === "string") out[""] = own;
  for (const [key, value] of Object.entries(error)) {
    if (key === "ref" || key === "message" || key === "type") continue;
    const message = (value as { message?: unknown } | undefined)?.message;
    if (typeof message === "string") out[key] = message;
  }
  return out;
}
