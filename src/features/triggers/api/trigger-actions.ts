import { useMutation, useQueryClient } from "@tanstack/react-query";
import { z } from "zod";
import { triggerDetailDto, type TriggerDetailDto } from "@shared/api/triggers.ts";
import { api } from "@/lib/api-client.ts";
import { triggerKeys } from "./trigger-keys.ts";

const triggerEnvelope = z.object({ trigger: triggerDetailDto });

export async function acknowledgeTrigger({ triggerId, note }: { triggerId: number; note?: string }): Promise<TriggerDetailDto> {
  const body = note && note.trim() ? { note: note.trim() } : {};
  return (await api.post(`/api/triggers/${triggerId}/acknowledge`, body, { schema: triggerEnvelope })).trigger;
}

export async function commentOnTrigger({ triggerId, text }: { triggerId: number; text: string }): Promise<TriggerDetailDto> {
  return (await api.post(`/api/triggers/${triggerId}/comments`, { text }, { schema: triggerEnvelope })).trigger;
}

export async function closeAsFalseAlarm({ triggerId, reason }: { triggerId: number; reason: string }): Promise<TriggerDetailDto> {
  return (await api.post(`/api/triggers/${triggerId}/false-alarm`, { reason }, { schema: triggerEnvelope })).trigger;
}

/** A trigger action that puts the fresh detail in the cache and refreshes the lists that show it. */
function useTriggerAction<Input>(action: (input: Input) => Promise<TriggerDetailDto>) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: action,
    onSuccess: (trigger) => {
      queryClient.setQueryData(triggerKeys.detail(trigger.id), trigger);
      void queryClient.invalidateQueries({ queryKey: triggerKeys.timeline() });
      void queryClient.invalidateQueries({ queryKey: triggerKeys.active() });
    },
  });
}

export const useAcknowledgeTrigger = () => useTriggerAction(acknowledgeTrigger);
export const useCommentOnTrigger = () => useTriggerAction(commentOnTrigger);
export const useCloseAsFalseAlarm = () => useTriggerAction(closeAsFalseAlarm);
