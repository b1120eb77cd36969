import { queryOptions, useQuery } from "@tanstack/react-query";
import { z } from "zod";
import { gridGeometryDto } from "@shared/api/grids.ts";
import { decodeMaskBits } from "@shared/grid/mask-bits.ts";
import type { GridGeometry } from "@shared/grid/geometry-types.ts";
import { api } from "@/lib/api-client.ts";
import { triggerKeys } from "./trigger-keys.ts";

const maskReply = z.object({
  frame: z.object({ id: z.number().int(), model: z.string(), runTime: z.string(), validTime: z.string(), forecastHour: z.number() }),
  geometry: gridGeometryDto,
  /** Base64, one bit per grid point; null when the rule could not be checked on the frame. */
  mask: z.string().nullable(),
  missingFields: z.array(z.string()),
});

export interface TriggerMask {
  frame: z.infer<typeof maskReply>["frame"];
  geometry: GridGeometry;
  /** 1 where the rule was met inside the trigger's zone (index = j * nx + i). */
  mask: Uint8Array | null;
  missingFields: string[];
}

/** The matched area of one frame of a trigger, checked and unpacked at the edge. */
export async function getTriggerMask(triggerId: number, frameId: number, signal?: AbortSignal): Promise<TriggerMask> {
  const reply = await api.get(`/api/triggers/${triggerId}/frames/${frameId}/mask`, { schema: maskReply, signal });
  const geometry = reply.geometry as GridGeometry;
  return { frame: reply.frame, geometry, mask: reply.mask === null ? null : decodeMaskBits(reply.mask, geometry.nx * geometry.ny), missingFields: reply.missingFields };
}

export const triggerMaskQuery = (triggerId: number, frameId: number) =>
  queryOptions({
    queryKey: triggerKeys.mask(triggerId, frameId),
    queryFn: ({ signal }) => getTriggerMask(triggerId, frameId, signal),
    // The rule version and the frame are both immutable, so the area never changes.
    staleTime: Infinity,
  });

export function useTriggerMask(triggerId: number, frameId: number | null) {
  return useQuery({ ...triggerMaskQuery(triggerId, frameId ?? 0), enabled: frameId !== null });
}
