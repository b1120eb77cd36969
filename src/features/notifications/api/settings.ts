import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { z } from "zod";
import { notifySettingsDto, type NotifySettingsInput } from "@shared/api/notifications.ts";
import { api } from "@/lib/api-client.ts";
import { notifyKeys } from "./notify-keys.ts";

const settingsEnvelope = z.object({ settings: notifySettingsDto });

export function useNotifySettings(enabled = true) {
  return useQuery({
    queryKey: notifyKeys.settings(),
    queryFn: async ({ signal }) => (await api.get("/api/notifications/settings", { schema: settingsEnvelope, signal })).settings,
    enabled,
  });
}

export function useSaveNotifySettings() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: NotifySettingsInput) => (await api.put("/api/notifications/settings", input, { schema: settingsEnvelope })).settings,
    onSuccess: (settings) => queryClient.setQueryData(notifyKeys.settings(), settings),
  });
}
