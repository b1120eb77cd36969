import { useMutation, useQueryClient } from "@tanstack/react-query";
import { z } from "zod";
import { ruleDto, type CreateRuleInput, type UpdateRuleInput } from "@shared/api/rules.ts";
import { api } from "@/lib/api-client.ts";
import { ruleKeys } from "./rule-keys.ts";

const ruleEnvelope = z.object({ rule: ruleDto });

export async function createRule(input: CreateRuleInput) {
  const { rule } = await api.post("/api/rules", input, { schema: ruleEnvelope });
  return rule;
}

/** Saving an edit appends a new immutable version; `changeNote` says why. */
export async function updateRule({ id, input }: { id: number; input: UpdateRuleInput }) {
  const { rule } = await api.put(`/api/rules/${id}`, input, { schema: ruleEnvelope });
  return rule;
}

export function useCreateRule() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: createRule, onSuccess: () => queryClient.invalidateQueries({ queryKey: ruleKeys.all }) });
}

export function useUpdateRule() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: updateRule, onSuccess: () => queryClient.invalidateQueries({ queryKey: ruleKeys.all }) });
}
