import { can, type Permission, type Role } from "@shared/auth/permissions.ts";
import { paths } from "./paths.ts";

/** One entry of the main navigation. `shortcut` is the letter typed after "g". */
export interface NavItem {
  id: string;
  path: string;
  label: string;
  permission: Permission;
  shortcut: string;
}

/**
 * The main navigation, in display order. New areas (timeline, grids, rules, zones, history,
 * notifications) are added here and nowhere else: the menu, the route guard and the keyboard
 * shortcuts all read this list.
 */
export const NAV_ITEMS = [
  { id: "timeline", path: paths.timeline, label: "Timeline", permission: "triggers.read", shortcut: "t" },
  { id: "overview", path: paths.overview, label: "Overview", permission: "session.read", shortcut: "o" },
  { id: "grids", path: paths.grids, label: "Grids", permission: "grids.read", shortcut: "m" },
  { id: "soundings", path: paths.soundings, label: "Soundings", permission: "soundings.diagnose", shortcut: "s" },
  { id: "rules", path: paths.rules, label: "Rules", permission: "rules.read", shortcut: "r" },
  { id: "zones", path: paths.zones, label: "Zones", permission: "zones.read", shortcut: "z" },
  { id: "notifications", path: paths.notifications, label: "Notifications", permission: "oncall.read", shortcut: "n" },
  { id: "accounts", path: paths.accounts, label: "Accounts", permission: "users.read", shortcut: "a" },
  { id: "history", path: paths.history, label: "History", permission: "history.read", shortcut: "h" },
  { id: "verification", path: paths.verification, label: "Verification", permission: "verification.read", shortcut: "v" },
  { id: "audit", path: paths.audit, label: "Audit trail", permission: "audit.read", shortcut: "u" },
] as const satisfies readonly NavItem[];

export type NavItemId = (typeof NAV_ITEMS)[number]["id"];

export function navItem(id: NavItemId): NavItem {
  const item = NAV_ITEMS.find((entry) => entry.id === id);
  if (!item) throw new Error(`No navigation item with id "${id}"`);
  return item;
}

/** The items the given roles may use (the server enforces the same table). */
export function navItemsFor(roles: readonly Role[]): NavItem[] {
  return NAV_ITEMS.filter((item) => can(roles, item.permission));
}
