import { queryOptions, useQuery } from "@tanstack/react-query";
import { z } from "zod";
import { ruleDto, ruleVersionDto } from "@shared/api/rules.ts";
import { zoneDto } from "@shared/api/zones.ts";
import { api } from "@/lib/api-client.ts";
import { historyKeys } from "./history-keys.ts";

const rulesEnvelope = z.object({ rules: z.array(ruleDto) });
const zonesEnvelope = z.object({ zones: z.array(zoneDto) });
const versionsEnvelope = z.object({ versions: z.array(ruleVersionDto) });

/** Rules and zones to choose from in the filters (both readable by every role). */
export const filterOptionsQuery = () =>
  queryOptions({
    queryKey: historyKeys.options(),
    queryFn: async ({ signal }) => {
      const [{ rules }, { zones }] = await Promise.all([api.get("/api/rules", { schema: rulesEnvelope, signal }), api.get("/api/zones", { schema: zonesEnvelope, signal })]);
      return {
        rules: rules.map((r) => ({ id: r.id, name: r.name, currentVersion: r.current.version })).sort((a, b) => a.name.localeCompare(b.name)),
        zones: zones.map((z) => ({ id: z.id, code: z.code, name: z.name })),
      };
    },
    staleTime: 60_000,
  });

export function useFilterOptions() {
  return useQuery(filterOptionsQuery());
}

/** The saved versions of one rule, newest first. */
export function useRuleVersions(ruleId: number | undefined) {
  return useQuery({
    queryKey: historyKeys.versions(ruleId ?? 0),
    queryFn: async ({ signal }) => (await api.get(`/api/rules/${ruleId}/versions`, { schema: versionsEnvelope, signal })).versions,
    enabled: ruleId !== undefined,
    staleTime: 60_000,
  });
}
