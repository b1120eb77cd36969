import { useMutation, useQueryClient } from "@tanstack/react-query";
import { z } from "zod";
import { ruleDto } from "@shared/api/rules.ts";
import { api } from "@/lib/api-client.ts";
import { ruleKeys } from "./rule-keys.ts";

const ruleEnvelope = z.object({ rule: ruleDto });

/** Switching a rule on or off is saved as a new version, like any other edit. */
export async function setRuleEnabled({ id, enabled, changeNote = "" }: { id: number; enabled: boolean; changeNote?: string }) {
  const { rule } = await api.post(`/api/rules/${id}/enabled`, { enabled, changeNote }, { schema: ruleEnvelope });
  return rule;
}

export function useSetRuleEnabled() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: setRuleEnabled, onSuccess: () => queryClient.invalidateQueries({ queryKey: ruleKeys.all }) });
}
