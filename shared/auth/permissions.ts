/**
 * The one permission table: every action a route can perform, and the roles allowed to do it.
 * The server's guard middleware enforces it on every route; the client reads it only to hide
 * what a role cannot use.
 */
export const ROLES = ["lead", "forecaster", "manager", "admin"] as const;
export type Role = (typeof ROLES)[number];

export const ROLE_LABELS: Record<Role, string> = {
  lead: "Lead forecaster",
  forecaster: "Forecaster",
  manager: "Manager",
  admin: "Administrator",
};

const EVERYONE: readonly Role[] = ROLES;

export const PERMISSIONS = {
  "session.read": EVERYONE,
  "users.read": ["admin"],
  "users.write": ["admin"],
  "audit.read": ["manager", "admin"],
  "audit.verify": ["manager", "admin"],
  "audit.export": ["manager", "admin"],
  "history.read": ["manager", "admin"],
  // Storm reports are ground truth everyone sees on maps and the timeline; leads and managers load them.
  "reports.read": EVERYONE,
  "reports.upload": ["lead", "manager"],
  "verification.read": ["lead", "manager", "admin"],
  "verification.compare": ["lead", "manager"],
  "soundings.diagnose": EVERYONE,
  "catalogue.read": EVERYONE,
  "grids.read": EVERYONE,
  "grids.upload": ["lead", "forecaster", "admin"],
  "zones.read": EVERYONE,
  "zones.write": ["lead"],
  "rules.read": EVERYONE,
  "rules.write": ["lead"],
  "rules.backtest": ["lead"],
  "triggers.read": EVERYONE,
  "triggers.acknowledge": ["forecaster", "lead"],
  "triggers.comment": ["forecaster", "lead"],
  "triggers.close": ["lead"],
  // Contacts and templates are office data: leads and admins keep them, managers may look.
  "contacts.read": ["lead", "manager", "admin"],
  "contacts.write": ["lead", "admin"],
  // Everyone may see who is on shift; leads set the schedule.
  "oncall.read": EVERYONE,
  "oncall.write": ["lead", "admin"],
  // Who was told about a trigger, and how, is part of every trigger's record.
  "notifications.read": EVERYONE,
  "notifications.resend": ["lead", "admin"],
  "notifications.settings": ["admin"],
  // The local stand-ins for the mail and text services hold copies of every message.
  "fakes.read": ["admin"],
  "fakes.control": ["admin"],
} as const satisfies Record<string, readonly Role[]>;

export type Permission = keyof typeof PERMISSIONS;

/** True when any of the given roles holds the permission. */
export function can(roles: readonly Role[], permission: Permission): boolean {
  const allowed: readonly Role[] = PERMISSIONS[permission];
  return roles.some((role) => allowed.includes(role));
}
