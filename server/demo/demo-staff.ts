import type { Role } from "../../shared/auth/permissions.ts";

/**
 * The demo office's invented staff. The usernames are a fixed interface (scripts and the README
 * rely on them); the display names are made up and say so.
 */
export const DEMO_ACCOUNTS: ReadonlyArray<{ username: string; displayName: string; roles: Role[] }> = [
  { username: "lead", displayName: "Marisol Quenby (demo lead)", roles: ["lead", "forecaster"] },
  { username: "forecaster", displayName: "Tobin Achterberg (demo forecaster)", roles: ["forecaster"] },
  { username: "manager", displayName: "Ines Kovalczyk (demo manager)", roles: ["manager"] },
  { username: "admin", displayName: "Perrin Oduya (demo administrator)", roles: ["admin"] },
];
