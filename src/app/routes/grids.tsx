import { can } from "@shared/auth/permissions.ts";
import { GridsPage } from "@/features/grids/components/grids-page.tsx";
import { useSignedInUser } from "@/lib/auth.ts";

/** Lazy route module: React Router picks up `Component`. */
export function Component() {
  const user = useSignedInUser();
  return <GridsPage canUpload={can(user.roles, "grids.upload")} />;
}
