import { queryOptions, useQuery } from "@tanstack/react-query";
import { columnAtPointDto } from "@shared/api/soundings.ts";
import { api } from "@/lib/api-client.ts";
import { soundingKeys } from "./sounding-keys.ts";

/** The model column nearest a point of one frame, with its sounding report (GET /api/grids/frames/:id/column). */
export function getModelColumn(frameId: number, lat: number, lon: number, signal?: AbortSignal) {
  return api.get(`/api/grids/frames/${frameId}/column`, { query: { lat, lon }, schema: columnAtPointDto, signal });
}

export const modelColumnQuery = (frameId: number, lat: number, lon: number) =>
  queryOptions({
    queryKey: soundingKeys.column(frameId, lat, lon),
    queryFn: ({ signal }) => getModelColumn(frameId, lat, lon, signal),
    // A stored frame never changes, so its columns stay fresh for the whole visit.
    staleTime: Number.POSITIVE_INFINITY,
  });

export function useModelColumn(frameId: number, lat: number, lon: number) {
  return useQuery(modelColumnQuery(frameId, lat, lon));
}
