import { queryOptions, useQuery } from "@tanstack/react-query";
import { z } from "zod";
import { ruleDto, type RuleDto } from "@shared/api/rules.ts";
import { api } from "@/lib/api-client.ts";
import { ruleKeys } from "./rule-keys.ts";

const rulesEnvelope = z.object({ rules: z.array(ruleDto) });

export async function getRules(signal?: AbortSignal): Promise<RuleDto[]> {
  const { rules } = await api.get("/api/rules", { schema: rulesEnvelope, signal });
  return rules;
}

export const rulesQuery = () => queryOptions({ queryKey: ruleKeys.list(), queryFn: ({ signal }) => getRules(signal) });

export function useRules() {
  return useQuery(rulesQuery());
}
