import { queryOptions, useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { z } from "zod";
import { contactDto, groupDto, type ContactInput, type GroupInput } from "@shared/api/notifications.ts";
import { api } from "@/lib/api-client.ts";
import { notifyKeys } from "./notify-keys.ts";

const contactsEnvelope = z.object({ contacts: z.array(contactDto) });
const contactEnvelope = z.object({ contact: contactDto });
const groupsEnvelope = z.object({ groups: z.array(groupDto) });
const groupEnvelope = z.object({ group: groupDto });

export const contactsQuery = () =>
  queryOptions({ queryKey: notifyKeys.contacts(), queryFn: async ({ signal }) => (await api.get("/api/contacts", { schema: contactsEnvelope, signal })).contacts });

export function useContacts(enabled = true) {
  return useQuery({ ...contactsQuery(), enabled });
}

export const groupsQuery = () =>
  queryOptions({ queryKey: notifyKeys.groups(), queryFn: async ({ signal }) => (await api.get("/api/contact-groups", { schema: groupsEnvelope, signal })).groups });

export function useGroups(enabled = true) {
  return useQuery({ ...groupsQuery(), enabled });
}

/** Contacts and groups change each other (membership), so every save refreshes the whole area. */
function useInvalidateAll() {
  const queryClient = useQueryClient();
  return () => queryClient.invalidateQueries({ queryKey: notifyKeys.all });
}

export function useSaveContact() {
  const invalidate = useInvalidateAll();
  return useMutation({
    mutationFn: async ({ id, input }: { id: number | null; input: ContactInput }) =>
      (id === null ? await api.post("/api/contacts", input, { schema: contactEnvelope }) : await api.put(`/api/contacts/${id}`, input, { schema: contactEnvelope })).contact,
    onSuccess: invalidate,
  });
}

export function useDeleteContact() {
  const invalidate = useInvalidateAll();
  return useMutation({ mutationFn: (id: number) => api.delete<void>(`/api/contacts/${id}`), onSuccess: invalidate });
}

export function useSaveGroup() {
  const invalidate = useInvalidateAll();
  return useMutation({
    mutationFn: async ({ id, input }: { id: number | null; input: GroupInput }) =>
      (id === null ? await api.post("/api/contact-groups", input, { schema: groupEnvelope }) : await api.put(`/api/contact-groups/${id}`, input, { schema: groupEnvelope })).group,
    onSuccess: invalidate,
  });
}

export function useDeleteGroup() {
  const invalidate = useInvalidateAll();
  return useMutation({ mutationFn: (id: number) => api.delete<void>(`/api/contact-groups/${id}`), onSuccess: invalidate });
}
