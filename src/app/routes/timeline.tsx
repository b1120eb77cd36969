import { can } from "@shared/auth/permissions.ts";
import { TimelinePage } from "@/features/triggers/components/timeline-page.tsx";
import { useSignedInUser } from "@/lib/auth.ts";

/** Lazy route module: the timeline, the home page of the signed-in area. */
export function Component() {
  const user = useSignedInUser();
  return <TimelinePage canAcknowledge={can(user.roles, "triggers.acknowledge")} />;
}
