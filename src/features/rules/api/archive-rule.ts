import { useMutation, useQueryClient } from "@tanstack/react-query";
import { api } from "@/lib/api-client.ts";
import { ruleKeys } from "./rule-keys.ts";

/** Archived rules stop running; their versions stay for the triggers and the audit trail. */
export async function archiveRule(id: number): Promise<void> {
  await api.delete<void>(`/api/rules/${id}`);
}

export function useArchiveRule() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: archiveRule, onSuccess: () => queryClient.invalidateQueries({ queryKey: ruleKeys.all }) });
}
