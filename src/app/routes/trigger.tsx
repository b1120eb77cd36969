import { useParams } from "react-router-dom";
import { can } from "@shared/auth/permissions.ts";
import { NotFound } from "@/components/errors/not-found.tsx";
import { TriggerPage } from "@/features/triggers/components/trigger-page.tsx";
import { TriggerDeliveries } from "@/features/notifications/components/trigger-deliveries.tsx";
import { useSignedInUser } from "@/lib/auth.ts";

/** Lazy route module: the page of one trigger, `/triggers/:triggerId`. */
export function Component() {
  const { triggerId } = useParams();
  const user = useSignedInUser();
  const id = Number(triggerId);
  if (!Number.isInteger(id) || id <= 0) return <NotFound />;
  const permissions = {
    canAcknowledge: can(user.roles, "triggers.acknowledge"),
    canComment: can(user.roles, "triggers.comment"),
    canClose: can(user.roles, "triggers.close"),
  };
  return <TriggerPage key={id} triggerId={id} permissions={permissions} deliveries={<TriggerDeliveries triggerId={id} />} />;
}
