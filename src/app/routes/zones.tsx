import { can } from "@shared/auth/permissions.ts";
import { ZonesPage } from "@/features/zones/components/zones-page.tsx";
import { useSignedInUser } from "@/lib/auth.ts";

/** Lazy route module: React Router picks up `Component`. */
export function Component() {
  const user = useSignedInUser();
  return <ZonesPage canEdit={can(user.roles, "zones.write")} />;
}
