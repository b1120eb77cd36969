/** Every client URL in one place, so links and routes never drift apart. */
export const paths = {
  overview: "/",
  login: "/login",
  soundings: "/soundings",
  accounts: "/admin/accounts",
  audit: "/audit",
} as const;

/** The sign-in URL that returns the user to `next` afterwards. */
export function loginPathFor(next: string): string {
  const target = safeNextPath(next);
  return target === paths.overview ? paths.login : `${paths.login}?next=${encodeURIComponent(target)}`;
}

/**
 * Where to go after signing in. Only same-site paths are accepted ("/audit?page=2"), so a crafted
 * link cannot send someone to another site; anything else falls back to the overview.
 */
export function safeNextPath(next: string | null | undefined): string {
  if (!next || !next.startsWith("/") || next.startsWith("//") || next.startsWith("/\\")) return paths.overview;
  if (next === paths.login || next.startsWith(`${paths.login}?`) || next.startsWith(`${paths.login}/`)) return paths.overview;
  return next;
}
