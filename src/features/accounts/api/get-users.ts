import { queryOptions, useQuery } from "@tanstack/react-query";
import { z } from "zod";
import { userDto } from "@shared/api/auth.ts";
import { api } from "@/lib/api-client.ts";
import { userKeys } from "./user-keys.ts";

const usersEnvelope = z.object({ users: z.array(userDto) });

export async function getUsers(signal?: AbortSignal) {
  const { users } = await api.get("/api/users", { schema: usersEnvelope, signal });
  return users;
}

export const usersQuery = () => queryOptions({ queryKey: userKeys.list(), queryFn: ({ signal }) => getUsers(signal) });

export function useUsers() {
  return useQuery(usersQuery());
}
