import { useMutation, useQueryClient } from "@tanstack/react-query";
import { z } from "zod";
import { zoneDto } from "@shared/api/zones.ts";
import { api } from "@/lib/api-client.ts";
import { zoneKeys } from "./zone-keys.ts";

const zonesEnvelope = z.object({ zones: z.array(zoneDto) });

/** Uploads a GeoJSON FeatureCollection file; the server creates every zone in it or none. */
export async function importZonesFile(file: File) {
  const body = new FormData();
  body.append("file", file);
  const { zones } = await api.post("/api/zones/import", body, { schema: zonesEnvelope });
  return zones;
}

export function useImportZones() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: importZonesFile, onSuccess: () => queryClient.invalidateQueries({ queryKey: zoneKeys.all }) });
}
