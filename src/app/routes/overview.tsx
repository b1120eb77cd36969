import { navItemsFor } from "@/config/navigation.ts";
import { OverviewPage } from "@/features/overview/components/overview-page.tsx";
import { useSignedInUser } from "@/lib/auth.ts";

export function OverviewRoute() {
  const user = useSignedInUser();
  return <OverviewPage displayName={user.displayName} roles={user.roles} areas={navItemsFor(user.roles)} />;
}
