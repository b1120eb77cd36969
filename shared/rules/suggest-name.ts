/**
 * "Did you mean ...?" for mistyped field and function names: the candidates with the smallest edit
 * distance (insertions, deletions, substitutions and swaps of neighbours each cost 1), if close enough.
 */

/** Closest candidates, best first (at most `limit`), or none when nothing is plausibly meant. */
export function suggestNames(typed: string, candidates: readonly string[], limit = 3): string[] {
  const lower = typed.toLowerCase();
  const sameLetters = candidates.find((name) => name.toLowerCase() === lower);
  if (sameLetters) return [sameLetters]; // only the case differs
  const allowed = Math.max(2, Math.floor(lower.length / 3));
  const scored = candidates
    .map((name) => ({ name, distance: editDistance(lower, name.toLowerCase()) }))
    .filter((c) => c.distance <= allowed)
    .sort((a, b) => a.distance - b.distance || a.name.localeCompare(b.name));
  if (scored.length > 0) return scored.slice(0, limit).map((c) => c.name);
  // A fragment such as "cape" is too far from every key by edits but still says which family is meant.
  if (lower.length >= 3) return candidates.filter((name) => name.includes(lower)).slice(0, limit);
  return [];
}

/** Optimal-string-alignment distance: Levenshtein plus the swap of two neighbouring letters. */
export function editDistance(a: string, b: string): number {
  const rows = a.length + 1;
  const cols = b.length + 1;
  const d = new Array<number>(rows * cols);
  for (let i = 0; i < rows; i++) d[i * cols] = i;
  for (let j = 0; j < cols; j++) d[j] = j;
  for (let i = 1; i < rows; i++) {
    for (let j = 1; j < cols; j++) {
      const cost = a[i - 1] === b[j - 1] ? 0 : 1;
      let best = Math.min(d[(i - 1) * cols + j] + 1, d[i * cols + j - 1] + 1, d[(i - 1) * cols + j - 1] + cost);
      if (i > 1 && j > 1 && a[i - 1] === b[j - 2] && a[i - 2] === b[j - 1]) best = Math.min(best, d[(i - 2) * cols + j - 2] + 1);
      d[i * cols + j] = best;
    }
  }
  return d[rows * cols - 1];
}

/** " Did you mean "x"?" / " Did you mean "x", "y" or "z"?" / "" */
export function didYouMean(suggestions: readonly string[]): string {
  if (suggestions.length === 0) return "";
  const quoted = suggestions.map((s) => `"${s}"`);
  const list = quoted.length === 1 ? quoted[0] : `${quoted.slice(0, -1).join(", ")} or ${quoted[quoted.length - 1]}`;
  return ` Did you mean ${list}?`;
}
