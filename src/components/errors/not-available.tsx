import { Link } from "react-router-dom";
import { ROLE_LABELS, type Role } from "@shared/auth/permissions.ts";

/** Shown instead of a page the signed-in roles cannot use. The server refuses the data anyway. */
export function NotAvailable({ area, roles }: { area: string; roles: readonly Role[] }) {
  const held = roles.map((role) => ROLE_LABELS[role]).join(", ") || "no roles";
  return (
    <section aria-labelledby="not-available-title" className="mx-auto mt-10 max-w-xl rounded-md border border-line bg-surface p-5">
      <h1 id="not-available-title" className="text-base font-semibold">
        {area} is not available for your roles
      </h1>
      <p className="mt-1 text-muted">
        You are signed in as {held}. If you need this page, ask an administrator to adjust your roles.
      </p>
      <Link to="/" className="mt-4 inline-block text-accent underline underline-offset-2">
        Back to the overview
      </Link>
    </section>
  );
}
