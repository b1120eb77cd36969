import { useRef } from "react";
import { Navigate, Outlet, useLocation } from "react-router-dom";
import { can } from "@shared/auth/permissions.ts";
import { AppLayout } from "@/components/layouts/app-layout.tsx";
import { navItemsFor } from "@/config/navigation.ts";
import { loginPathFor, paths } from "@/config/paths.ts";
import { useCurrentUser, useSignOut } from "@/lib/auth.ts";
import { describeErrorLine } from "@/lib/describe-error.ts";
import { useToast } from "@/components/ui/toaster.tsx";
import { TriggerAlerts } from "@/features/triggers/components/trigger-alerts.tsx";

/** The signed-in shell. The route loader guarantees a session on entry; this handles losing it later. */
export function AppRoot() {
  const { data: user } = useCurrentUser();
  const location = useLocation();
  const signOut = useSignOut();
  const toast = useToast();
  const signedOutOnPurpose = useRef(false);

  if (!user) {
    // After "Sign out" start afresh; after an expired session, come back to this page.
    const target = signedOutOnPurpose.current ? paths.login : loginPathFor(location.pathname + location.search);
    return <Navigate to={target} replace />;
  }

  const handleSignOut = () => {
    signedOutOnPurpose.current = true;
    signOut.mutate(undefined, {
      onError: (error) => toast.error("Sign-out did not reach the server", describeErrorLine(error)),
    });
  };

  return (
    <AppLayout user={user} navItems={navItemsFor(user.roles)} onSignOut={handleSignOut} signingOut={signOut.isPending}>
      {/* New triggers chime, show a notice and count in the tab title on every page, not only the timeline. */}
      {can(user.roles, "triggers.read") && <TriggerAlerts />}
      <Outlet />
    </AppLayout>
  );
}
