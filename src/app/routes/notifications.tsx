import { can } from "@shared/auth/permissions.ts";
import { NotificationsPage } from "@/features/notifications/components/notifications-page.tsx";
import { useSignedInUser } from "@/lib/auth.ts";

/** Lazy route module: the Notifications area (tabs by `?tab=`). */
export function Component() {
  const user = useSignedInUser();
  return (
    <NotificationsPage
      permissions={{
        canReadContacts: can(user.roles, "contacts.read"),
        canWriteContacts: can(user.roles, "contacts.write"),
        canWriteOnCall: can(user.roles, "oncall.write"),
        canWriteSettings: can(user.roles, "notifications.settings"),
        canLinkAccounts: can(user.roles, "users.read"),
        canReadFakes: can(user.roles, "fakes.read"),
      }}
    />
  );
}
