import { useMutation, useQueryClient } from "@tanstack/react-query";
import { z } from "zod";
import { zoneDto, type UpdateZoneInput } from "@shared/api/zones.ts";
import { api } from "@/lib/api-client.ts";
import { zoneKeys } from "./zone-keys.ts";

const zoneEnvelope = z.object({ zone: zoneDto });

export async function updateZone({ id, changes }: { id: number; changes: UpdateZoneInput }) {
  const { zone } = await api.patch(`/api/zones/${id}`, changes, { schema: zoneEnvelope });
  return zone;
}

export function useUpdateZone() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: updateZone, onSuccess: () => queryClient.invalidateQueries({ queryKey: zoneKeys.all }) });
}
