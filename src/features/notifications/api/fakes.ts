import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { z } from "zod";
import { fakeMailDto, fakeSmsDto, fakesStatusDto, type FakesBehaviourInput } from "@shared/api/notifications.ts";
import { api } from "@/lib/api-client.ts";
import { notifyKeys } from "./notify-keys.ts";

const statusEnvelope = z.object({ fakes: fakesStatusDto });

/** The fakes fill up as the dispatcher sends, so the admin's view polls while it is open. */
const POLL_MS = 4000;

export function useFakeMail() {
  return useQuery({ queryKey: notifyKeys.fakeMail(), queryFn: ({ signal }) => api.get("/api/fakes/mail", { schema: z.array(fakeMailDto), signal }), refetchInterval: POLL_MS });
}

export function useFakeSms() {
  return useQuery({ queryKey: notifyKeys.fakeSms(), queryFn: ({ signal }) => api.get("/api/fakes/sms", { schema: z.array(fakeSmsDto), signal }), refetchInterval: POLL_MS });
}

export function useFakesStatus() {
  return useQuery({ queryKey: notifyKeys.fakeStatus(), queryFn: async ({ signal }) => (await api.get("/api/fakes", { schema: statusEnvelope, signal })).fakes, refetchInterval: POLL_MS });
}

export function useSetFakeBehaviour() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: FakesBehaviourInput) => (await api.put("/api/fakes/behaviour", input, { schema: statusEnvelope })).fakes,
    onSuccess: (status) => queryClient.setQueryData(notifyKeys.fakeStatus(), status),
  });
}

export function useClearFakes() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: () => api.delete<void>("/api/fakes/messages"), onSuccess: () => queryClient.invalidateQueries({ queryKey: notifyKeys.fakes() }) });
}

/** Where the fakes page loads a stored e-mail's map image from. */
export const fakeMailAttachmentUrl = (mailId: number, index: number) => `/api/fakes/mail/${mailId}/attachments/${index}`;
