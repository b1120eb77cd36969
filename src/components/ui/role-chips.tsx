import { ROLE_LABELS, type Role } from "@shared/auth/permissions.ts";
import { Chip } from "./chip.tsx";

/** The roles of one account as chips, in the permission table's order. */
export function RoleChips({ roles }: { roles: readonly Role[] }) {
  if (roles.length === 0) return <span className="text-muted">No roles</span>;
  return (
    <span className="inline-flex flex-wrap gap-1">
      {roles.map((role) => (
        <Chip key={role} tone={role === "admin" ? "accent" : "neutral"}>
          {ROLE_LABELS[role]}
        </Chip>
      ))}
    </span>
  );
}
