/** Every client URL in one place, so links and routes never drift apart. */
export const paths = {
  /** Where signing in lands: the timeline. */
  home: "/",
  timeline: "/",
  overview: "/overview",
  triggers: "/triggers",
  login: "/login",
  soundings: "/soundings",
  grids: "/grids",
  accounts: "/admin/accounts",
  audit: "/audit",
  rules: "/rules",
  zones: "/zones",
  notifications: "/notifications",
  history: "/history",
  historyReport: "/history/report",
  verification: "/verification",
} as const;

/** The pages of one rule: the editor (read-only for roles that cannot edit), its history and its backtest. */
export const rulePaths = {
  create: () => `${paths.rules}/new`,
  detail: (ruleId: number) => `${paths.rules}/${ruleId}`,
  history: (ruleId: number) => `${paths.rules}/${ruleId}/history`,
  backtest: (ruleId: number) => `${paths.rules}/${ruleId}/backtest`,
};

/** The page of one trigger. */
export function triggerPath(triggerId: number): string {
  return `${paths.triggers}/${triggerId}`;
}

/**
 * The Soundings page showing the model column nearest a map point of one frame (the map viewer links here).
 * Coordinates are rounded to 4 decimals (about 10 m), far finer than any model grid.
 */
export function soundingLinkForPoint(frameId: number, lat: number, lon: number): string {
  const params = new URLSearchParams({ frame: String(frameId), lat: lat.toFixed(4), lon: lon.toFixed(4) });
  return `${paths.soundings}?${params.toString()}`;
}

/** The map viewer of one stored frame; `search` keeps the viewer's own settings ("?field=mlcape"). */
export function gridFramePath(frameId: number, search = ""): string {
  const query = search.startsWith("?") ? search.slice(1) : search;
  return `${paths.grids}/frames/${frameId}${query ? `?${query}` : ""}`;
}

/** The sign-in URL that returns the user to `next` afterwards. */
export function loginPathFor(next: string): string {
  const target = safeNextPath(next);
  return target === paths.home ? paths.login : `${paths.login}?next=${encodeURIComponent(target)}`;
}

/**
 * Where to go after signing in. Only same-site paths are accepted ("/audit?page=2"), so a crafted
 * link cannot send someone to another site; anything else falls back to the home page (the timeline).
 */
export function safeNextPath(next: string | null | undefined): string {
  if (!next || !next.startsWith("/") || next.startsWith("//") || next.startsWith("/\\")) return paths.home;
  if (next === paths.login || next.startsWith(`${paths.login}?`) || next.startsWith(`${paths.login}/`)) return paths.home;
  return next;
}
