import { ROLE_LABELS, ROLES, type Role } from "@shared/auth/permissions.ts";
import { ROLE_DESCRIPTIONS } from "@/config/role-descriptions.ts";

/** The role picker: one labelled checkbox per role, with what the role is for beneath it. */
export function RoleCheckboxes({
  value,
  onChange,
  error,
  disabledRoles = [],
}: {
  value: readonly Role[];
  onChange: (roles: Role[]) => void;
  error?: string;
  disabledRoles?: readonly Role[];
}) {
  const toggle = (role: Role, checked: boolean) => {
    const next = new Set(value);
    if (checked) next.add(role);
    else next.delete(role);
    // Keep the permission table's order so chips and payloads are stable.
    onChange(ROLES.filter((r) => next.has(r)));
  };
  return (
    <fieldset aria-invalid={error ? true : undefined} className="flex flex-col gap-1.5">
      <legend className="mb-1 text-xs font-medium text-muted">Roles</legend>
      {ROLES.map((role) => (
        <label key={role} className="flex cursor-pointer items-start gap-2 rounded border border-line px-2.5 py-1.5 hover:bg-raised">
          <input
            type="checkbox"
            className="mt-0.5 accent-[var(--bw-accent)]"
            checked={value.includes(role)}
            disabled={disabledRoles.includes(role)}
            onChange={(event) => toggle(role, event.target.checked)}
          />
          <span>
            <span className="font-medium">{ROLE_LABELS[role]}</span>
            <span className="block text-xs text-muted">{ROLE_DESCRIPTIONS[role]}</span>
          </span>
        </label>
      ))}
      {error && <p className="text-xs text-danger">{error}</p>}
    </fieldset>
  );
}
