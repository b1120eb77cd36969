import { useState } from "react";
import type { ContactDto, GroupDto } from "@shared/api/notifications.ts";
import { Button } from "@/components/ui/button.tsx";
import { Chip } from "@/components/ui/chip.tsx";
import { Loading } from "@/components/ui/loading.tsx";
import { Notice } from "@/components/ui/notice.tsx";
import { Panel } from "@/components/ui/panel.tsx";
import { describeError } from "@/lib/describe-error.ts";
import { useContacts, useDeleteContact, useGroups } from "../api/contacts.ts";
import { channelLabel } from "../delivery-words.ts";
import { ConfirmDeleteButton } from "./confirm-delete-button.tsx";
import { ContactDialog } from "./contact-dialog.tsx";

function quietText(c: ContactDto): string {
  return c.quietHours ? `${c.quietHours.start}–${c.quietHours.end} ${c.quietHours.timeZone}` : "none";
}

function groupNames(c: ContactDto, groups: readonly GroupDto[]): string {
  return c.groupIds.map((id) => groups.find((g) => g.id === id)?.name ?? `#${id}`).join(", ");
}

/** Everyone Bellwether can notify: staff with or without accounts, and outside partners. */
export function ContactsPanel({ canWrite, canLinkAccounts, officeTimeZone }: { canWrite: boolean; canLinkAccounts: boolean; officeTimeZone: string }) {
  const contacts = useContacts();
  const groups = useGroups();
  const remove = useDeleteContact();
  const [editing, setEditing] = useState<ContactDto | "new" | null>(null);

  return (
    <Panel title="Contacts" actions={canWrite ? <Button variant="primary" size="sm" onClick={() => setEditing("new")}>New contact</Button> : undefined}>
      {contacts.isPending && <Loading label="Loading contacts…" />}
      {contacts.isError && <Notice tone="danger" title="Could not load the contacts">{describeError(contacts.error).message}</Notice>}
      {contacts.data && contacts.data.length === 0 && <p className="text-muted">No contacts yet.</p>}
      {contacts.data && contacts.data.length > 0 && (
        <div className="overflow-x-auto">
          <table className="w-full text-left text-sm">
            <caption className="sr-only">Contacts</caption>
            <thead className="border-b border-line text-xs text-muted">
              <tr>
                <th scope="col" className="py-1.5 pr-3 font-medium">Name</th>
                <th scope="col" className="py-1.5 pr-3 font-medium">Addresses</th>
                <th scope="col" className="py-1.5 pr-3 font-medium">Channels</th>
                <th scope="col" className="py-1.5 pr-3 font-medium">Quiet hours</th>
                <th scope="col" className="py-1.5 pr-3 font-medium">Groups</th>
                {canWrite && <th scope="col"><span className="sr-only">Actions</span></th>}
              </tr>
            </thead>
            <tbody>
              {contacts.data.map((c) => (
                <tr key={c.id} className={`border-b border-line/60 align-top last:border-0 ${c.active ? "" : "text-muted"}`}>
                  <td className="py-1.5 pr-3">
                    <div>
                      {c.name} {!c.active && <Chip>Inactive</Chip>}
                    </div>
                    <div className="text-xs text-muted">{c.organisation || "Office staff"}{c.username ? ` · account ${c.username}` : ""}</div>
                  </td>
                  <td className="py-1.5 pr-3 font-mono text-xs">
                    <div>{c.email ?? "—"}</div>
                    <div>{c.mobile ?? "—"}</div>
                  </td>
                  <td className="py-1.5 pr-3 text-xs">{c.channels.map((channel) => channelLabel({ channel })).join(", ") || "none"}</td>
                  <td className="py-1.5 pr-3 font-mono text-xs">{quietText(c)}</td>
                  <td className="py-1.5 pr-3 text-xs">{groupNames(c, groups.data ?? []) || "—"}</td>
                  {canWrite && (
                    <td className="py-1.5 text-right whitespace-nowrap">
                      <Button size="sm" variant="ghost" onClick={() => setEditing(c)} aria-label={`Edit ${c.name}`}>
                        Edit
                      </Button>
                      <ConfirmDeleteButton id={c.id} what="Contact" label={`Delete ${c.name}`} mutation={remove} />
                    </td>
                  )}
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
      {editing && <ContactDialog contact={editing === "new" ? null : editing} officeTimeZone={officeTimeZone} canLinkAccounts={canLinkAccounts} onClose={() => setEditing(null)} />}
    </Panel>
  );
}
