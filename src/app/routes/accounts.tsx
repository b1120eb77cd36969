import { AccountsPage } from "@/features/accounts/components/accounts-page.tsx";
import { useSignedInUser } from "@/lib/auth.ts";

/** Lazy route module: React Router picks up `Component`. */
export function Component() {
  const user = useSignedInUser();
  return <AccountsPage currentUserId={user.id} />;
}
