import { queryOptions, useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { z } from "zod";
import { userDto, type LoginInput, type UserDto } from "@shared/api/auth.ts";
import { api, isApiError } from "./api-client.ts";
import type { AuthAwareMeta } from "./query-client.ts";

/** Query keys for the signed-in session. */
export const sessionKeys = {
  me: () => ["session", "me"] as const,
};

const userEnvelope = z.object({ user: userDto });

/** The signed-in user, or null when nobody is signed in (a 401 here is an answer, not a failure). */
export async function getCurrentUser(signal?: AbortSignal): Promise<UserDto | null> {
  try {
    const { user } = await api.get("/api/auth/me", { schema: userEnvelope, signal });
    return user;
  } catch (error) {
    if (isApiError(error) && error.status === 401) return null;
    throw error;
  }
}

export const currentUserQuery = () =>
  queryOptions({
    queryKey: sessionKeys.me(),
    queryFn: ({ signal }) => getCurrentUser(signal),
    staleTime: 60_000,
  });

export function useCurrentUser() {
  return useQuery(currentUserQuery());
}

/** The signed-in user inside the signed-in part of the app, where the route guard guarantees one. */
export function useSignedInUser(): UserDto {
  const { data } = useCurrentUser();
  if (!data) throw new Error("useSignedInUser is only for pages behind the sign-in guard");
  return data;
}

const signInMeta: AuthAwareMeta = { ignoreUnauthenticated: true };

export function useSignIn() {
  const queryClient = useQueryClient();
  return useMutation({
    meta: signInMeta,
    mutationFn: async (input: LoginInput) => {
      const { user } = await api.post("/api/auth/login", input, { schema: userEnvelope });
      return user;
    },
    onSuccess: (user) => {
      api.resetCsrfToken();
      // A new session starts clean: nothing cached for the previous user survives.
      queryClient.removeQueries({ predicate: (q) => q.queryKey[0] !== "session" });
      queryClient.setQueryData(sessionKeys.me(), user);
    },
  });
}

export function useSignOut() {
  const queryClient = useQueryClient();
  return useMutation({
    meta: signInMeta,
    mutationFn: () => api.post<void>("/api/auth/logout"),
    onSettled: () => {
      api.resetCsrfToken();
      queryClient.clear();
      queryClient.setQueryData(sessionKeys.me(), null);
    },
  });
}
