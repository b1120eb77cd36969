import { queryOptions, useQuery } from "@tanstack/react-query";
import { z } from "zod";
import { triggerDetailDto, type TriggerDetailDto } from "@shared/api/triggers.ts";
import { api } from "@/lib/api-client.ts";
import { triggerKeys } from "./trigger-keys.ts";

const triggerEnvelope = z.object({ trigger: triggerDetailDto });

export async function getTrigger(triggerId: number, signal?: AbortSignal): Promise<TriggerDetailDto> {
  const { trigger } = await api.get(`/api/triggers/${triggerId}`, { schema: triggerEnvelope, signal });
  return trigger;
}

export const triggerQuery = (triggerId: number) => queryOptions({ queryKey: triggerKeys.detail(triggerId), queryFn: ({ signal }) => getTrigger(triggerId, signal) });

export function useTrigger(triggerId: number) {
  return useQuery(triggerQuery(triggerId));
}
