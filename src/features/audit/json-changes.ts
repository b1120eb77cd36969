function isPlainObject(value: unknown): value is Record<string, unknown> {
  return typeof value === "object" && value !== null && !Array.isArray(value);
}

/**
 * The top-level keys whose values differ between an audit entry's before and after snapshots,
 * in a stable order, so a reviewer sees at once what an edit touched. Empty when either side is
 * missing or not an object (creations and deletions show the whole snapshot instead).
 */
export function changedTopLevelKeys(before: unknown, after: unknown): string[] {
  if (!isPlainObject(before) || !isPlainObject(after)) return [];
  const keys = new Set([...Object.keys(before), ...Object.keys(after)]);
  return [...keys].filter((key) => JSON.stringify(before[key]) !== JSON.stringify(after[key])).sort();
}

/** Pretty JSON for display; "—" when the snapshot is absent. */
export function formatSnapshot(value: unknown): string {
  if (value === null || value === undefined) return "—";
  return JSON.stringify(value, null, 2);
}
