import { useMutation, useQueryClient } from "@tanstack/react-query";
import { z } from "zod";
import { zoneDto, type CreateZoneInput } from "@shared/api/zones.ts";
import { api } from "@/lib/api-client.ts";
import { zoneKeys } from "./zone-keys.ts";

const zoneEnvelope = z.object({ zone: zoneDto });

export async function createZone(input: CreateZoneInput) {
  const { zone } = await api.post("/api/zones", input, { schema: zoneEnvelope });
  return zone;
}

export function useCreateZone() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: createZone, onSuccess: () => queryClient.invalidateQueries({ queryKey: zoneKeys.all }) });
}
