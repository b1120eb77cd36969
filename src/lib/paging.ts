/** Entries shown on a 1-based page, inclusive ("51–100 of 234"); null when the page holds none. */
export function pageRange(page: number, pageSize: number, total: number): { first: number; last: number } | null {
  const first = (page - 1) * pageSize + 1;
  if (total <= 0 || page < 1 || first > total) return null;
  return { first, last: Math.min(page * pageSize, total) };
}

/** Number of pages; at least one, so "page 1 of 1" reads naturally for an empty list. */
export function pageCount(pageSize: number, total: number): number {
  return Math.max(1, Math.ceil(total / pageSize));
}
