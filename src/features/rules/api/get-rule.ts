import { queryOptions, useQuery } from "@tanstack/react-query";
import { z } from "zod";
import { ruleDto, type RuleDto } from "@shared/api/rules.ts";
import { api } from "@/lib/api-client.ts";
import { ruleKeys } from "./rule-keys.ts";

const ruleEnvelope = z.object({ rule: ruleDto });

export async function getRule(ruleId: number, signal?: AbortSignal): Promise<RuleDto> {
  const { rule } = await api.get(`/api/rules/${ruleId}`, { schema: ruleEnvelope, signal });
  return rule;
}

export const ruleQuery = (ruleId: number) => queryOptions({ queryKey: ruleKeys.detail(ruleId), queryFn: ({ signal }) => getRule(ruleId, signal) });

export function useRule(ruleId: number) {
  return useQuery(ruleQuery(ruleId));
}
