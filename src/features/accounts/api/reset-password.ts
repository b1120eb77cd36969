import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { ResetPasswordInput } from "@shared/api/users.ts";
import { api } from "@/lib/api-client.ts";
import { userKeys } from "./user-keys.ts";

export async function resetPassword({ id, input }: { id: number; input: ResetPasswordInput }): Promise<void> {
  await api.post<void>(`/api/users/${id}/password`, input);
}

export function useResetPassword() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: resetPassword,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: userKeys.all }),
  });
}
