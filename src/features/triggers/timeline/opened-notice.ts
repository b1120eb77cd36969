import { compareSeverity, severityLevel, SEVERITY_KEYS, type Severity } from "@shared/rules/severity.ts";

const isSeverity = (value: string): value is Severity => (SEVERITY_KEYS as readonly string[]).includes(value);

/**
 * One notice for a burst of newly opened triggers (a frame often opens several at once): the
 * count and the severities, most severe first. "New Urgent trigger opened";
 * "3 new triggers opened: 1 Urgent, 2 Heads-up".
 */
export function openedNotice(severities: readonly string[]): string {
  if (severities.length === 0) return "";
  const label = (key: string) => (isSeverity(key) ? severityLevel(key).label : key);
  if (severities.length === 1) return `New ${label(severities[0]!)} trigger opened`;
  const counts = new Map<string, number>();
  for (const severity of severities) counts.set(severity, (counts.get(severity) ?? 0) + 1);
  const ordered = [...counts].sort(([a], [b]) => (isSeverity(a) && isSeverity(b) ? compareSeverity(b, a) : a.localeCompare(b)));
  return `${severities.length} new triggers opened: ${ordered.map(([key, count]) => `${count} ${label(key)}`).join(", ")}`;
}
