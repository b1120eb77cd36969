import { queryOptions, useQuery } from "@tanstack/react-query";
import { z } from "zod";
import { zoneDto, type ZoneDto } from "@shared/api/zones.ts";
import { api } from "@/lib/api-client.ts";
import { zoneKeys } from "./zone-keys.ts";

const zonesEnvelope = z.object({ zones: z.array(zoneDto) });

export async function getZones(signal?: AbortSignal): Promise<ZoneDto[]> {
  const { zones } = await api.get("/api/zones", { schema: zonesEnvelope, signal });
  return zones;
}

export const zonesQuery = () => queryOptions({ queryKey: zoneKeys.list(), queryFn: ({ signal }) => getZones(signal) });

export function useZones() {
  return useQuery(zonesQuery());
}
