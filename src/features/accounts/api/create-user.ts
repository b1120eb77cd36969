import { useMutation, useQueryClient } from "@tanstack/react-query";
import { z } from "zod";
import { userDto } from "@shared/api/auth.ts";
import type { CreateUserInput } from "@shared/api/users.ts";
import { api } from "@/lib/api-client.ts";
import { userKeys } from "./user-keys.ts";

const userEnvelope = z.object({ user: userDto });

export async function createUser(input: CreateUserInput) {
  const { user } = await api.post("/api/users", input, { schema: userEnvelope });
  return user;
}

export function useCreateUser() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createUser,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: userKeys.all }),
  });
}
