import { Outlet } from "react-router-dom";
import { can } from "@shared/auth/permissions.ts";
import { navItem, type NavItemId } from "@/config/navigation.ts";
import { NotAvailable } from "@/components/errors/not-available.tsx";
import { useSignedInUser } from "@/lib/auth.ts";

/**
 * Renders the child route only when the signed-in roles hold the area's permission (taken from
 * the navigation list, so menu and guard always agree); otherwise a calm explanation. This only
 * hides UI: the server refuses the data to the same roles.
 */
export function RequirePermission({ area }: { area: NavItemId }) {
  const user = useSignedInUser();
  const item = navItem(area);
  if (!can(user.roles, item.permission)) return <NotAvailable area={item.label} roles={user.roles} />;
  return <Outlet />;
}
