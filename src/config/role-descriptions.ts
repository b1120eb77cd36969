import type { Role } from "@shared/auth/permissions.ts";

/** What each role is for, in a sentence, for the overview and the account forms. */
export const ROLE_DESCRIPTIONS: Record<Role, string> = {
  lead: "Owns the office's alert rules: writes, tests and versions them, draws the forecast zones and sets the on-call rota.",
  forecaster: "Works the shift: follows the timeline, acknowledges and comments on triggers, and checks grids and soundings.",
  manager: "Reviews afterwards: what fired, who was told and how it verified, through the audit trail and exports. Changes nothing operational.",
  admin: "Looks after accounts and roles, contact details, and the system's settings.",
};
