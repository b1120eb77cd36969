import { useMutation, useQueryClient } from "@tanstack/react-query";
import { z } from "zod";
import { userDto } from "@shared/api/auth.ts";
import type { UpdateUserInput } from "@shared/api/users.ts";
import { api } from "@/lib/api-client.ts";
import { sessionKeys } from "@/lib/auth.ts";
import { userKeys } from "./user-keys.ts";

const userEnvelope = z.object({ user: userDto });

export async function updateUser({ id, changes }: { id: number; changes: UpdateUserInput }) {
  const { user } = await api.patch(`/api/users/${id}`, changes, { schema: userEnvelope });
  return user;
}

export function useUpdateUser() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateUser,
    onSuccess: async () => {
      // An admin may have changed their own name or roles, which the header shows.
      await Promise.all([
        queryClient.invalidateQueries({ queryKey: userKeys.all }),
        queryClient.invalidateQueries({ queryKey: sessionKeys.me() }),
      ]);
    },
  });
}
