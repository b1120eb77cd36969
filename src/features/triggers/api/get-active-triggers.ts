import { queryOptions, useQuery } from "@tanstack/react-query";
import { z } from "zod";
import { triggerSummaryDto, type TriggerSummaryDto } from "@shared/api/triggers.ts";
import { api } from "@/lib/api-client.ts";
import { triggerKeys } from "./trigger-keys.ts";

/** The most active triggers listed at once; an office with more has bigger problems than a list. */
export const ACTIVE_LIMIT = 500;

const triggersEnvelope = z.object({ triggers: z.array(triggerSummaryDto) });

/** Open and acknowledged triggers, newest first: the title badge counts them, the handover lists them. */
export async function getActiveTriggers(signal?: AbortSignal): Promise<TriggerSummaryDto[]> {
  const { triggers } = await api.get("/api/triggers", { schema: triggersEnvelope, query: { active: "true", limit: ACTIVE_LIMIT }, signal });
  return triggers;
}

export const activeTriggersQuery = () =>
  queryOptions({ queryKey: triggerKeys.active(), queryFn: ({ signal }) => getActiveTriggers(signal), refetchInterval: 120_000 });

export function useActiveTriggers() {
  return useQuery(activeTriggersQuery());
}
