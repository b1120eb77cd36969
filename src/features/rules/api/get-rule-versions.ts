import { queryOptions, useQuery } from "@tanstack/react-query";
import { z } from "zod";
import { ruleVersionDto, type RuleVersionDto } from "@shared/api/rules.ts";
import { api } from "@/lib/api-client.ts";
import { ruleKeys } from "./rule-keys.ts";

const versionsEnvelope = z.object({ versions: z.array(ruleVersionDto) });

/** Every saved version of a rule, newest first. */
export async function getRuleVersions(ruleId: number, signal?: AbortSignal): Promise<RuleVersionDto[]> {
  const { versions } = await api.get(`/api/rules/${ruleId}/versions`, { schema: versionsEnvelope, signal });
  return versions;
}

export const ruleVersionsQuery = (ruleId: number) =>
  queryOptions({ queryKey: ruleKeys.versions(ruleId), queryFn: ({ signal }) => getRuleVersions(ruleId, signal) });

export function useRuleVersions(ruleId: number) {
  return useQuery(ruleVersionsQuery(ruleId));
}
