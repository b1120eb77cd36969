import { useMutation, useQueryClient } from "@tanstack/react-query";
import { api } from "@/lib/api-client.ts";
import { zoneKeys } from "./zone-keys.ts";

/** Zones are archived, never deleted: rule versions and triggers keep pointing at them. */
export async function archiveZone(id: number): Promise<void> {
  await api.delete<void>(`/api/zones/${id}`);
}

export function useArchiveZone() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: archiveZone, onSuccess: () => queryClient.invalidateQueries({ queryKey: zoneKeys.all }) });
}
