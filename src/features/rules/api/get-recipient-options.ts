import { useQuery } from "@tanstack/react-query";
import { z } from "zod";
import { contactDto, groupDto } from "@shared/api/notifications.ts";
import { api } from "@/lib/api-client.ts";
import type { RecipientOptions } from "../editor/rule-editor-types.ts";
import { ruleKeys } from "./rule-keys.ts";

const contactsEnvelope = z.object({ contacts: z.array(contactDto) });
const groupsEnvelope = z.object({ groups: z.array(groupDto) });

/** The contacts and contact groups a rule may notify, as picker options. */
export async function getRecipientOptions(signal?: AbortSignal): Promise<RecipientOptions> {
  const [{ contacts }, { groups }] = await Promise.all([
    api.get("/api/contacts", { schema: contactsEnvelope, signal }),
    api.get("/api/contact-groups", { schema: groupsEnvelope, signal }),
  ]);
  return {
    contacts: contacts.map((c) => ({ id: c.id, label: `${c.name}${c.organisation ? ` (${c.organisation})` : ""}${c.active ? "" : " · inactive"}` })),
    groups: groups.map((g) => ({ id: g.id, label: `${g.name} · ${g.contactIds.length === 1 ? "1 contact" : `${g.contactIds.length} contacts`}` })),
  };
}

const UNAVAILABLE: RecipientOptions = { contacts: null, groups: null };

/**
 * Picker options for roles that may read contacts; for the others (and while loading or on failure)
 * both lists are null, and the editor shows the ids as they are stored.
 */
export function useRecipientOptions(canReadContacts: boolean): RecipientOptions {
  const query = useQuery({
    queryKey: [...ruleKeys.all, "recipient-options"] as const,
    queryFn: ({ signal }) => getRecipientOptions(signal),
    enabled: canReadContacts,
    staleTime: 60_000,
  });
  return query.data ?? UNAVAILABLE;
}
