import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { z } from "zod";
import { notificationDto } from "@shared/api/notifications.ts";
import { api } from "@/lib/api-client.ts";
import { notifyKeys } from "./notify-keys.ts";

const listEnvelope = z.object({ notifications: z.array(notificationDto) });
const oneEnvelope = z.object({ notification: notificationDto });

/** Every message written for one trigger (digests that carried it included), newest first. */
export function useTriggerDeliveries(triggerId: number) {
  return useQuery({
    queryKey: notifyKeys.deliveries(triggerId),
    queryFn: async ({ signal }) => (await api.get("/api/notifications", { query: { triggerId, limit: 500 }, schema: listEnvelope, signal })).notifications,
    // Queued and retrying rows change without a trigger event; look again while any is in flight.
    refetchInterval: (query) => (query.state.data?.some((n) => n.state === "queued" || n.state === "sending") ? 3000 : false),
  });
}

export function useResendNotification(triggerId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (id: number) => (await api.post(`/api/notifications/${id}/resend`, {}, { schema: oneEnvelope })).notification,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: notifyKeys.deliveries(triggerId) }),
  });
}
