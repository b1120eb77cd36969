import { useState } from "react";
import type { GroupDto } from "@shared/api/notifications.ts";
import { Button } from "@/components/ui/button.tsx";
import { Loading } from "@/components/ui/loading.tsx";
import { Notice } from "@/components/ui/notice.tsx";
import { Panel } from "@/components/ui/panel.tsx";
import { describeError } from "@/lib/describe-error.ts";
import { useContacts, useDeleteGroup, useGroups } from "../api/contacts.ts";
import { ConfirmDeleteButton } from "./confirm-delete-button.tsx";
import { GroupDialog } from "./group-dialog.tsx";

/** Contact groups and their members. */
export function GroupsPanel({ canWrite }: { canWrite: boolean }) {
  const groups = useGroups();
  const contacts = useContacts();
  const remove = useDeleteGroup();
  const [editing, setEditing] = useState<GroupDto | "new" | null>(null);
  const nameOf = (id: number) => contacts.data?.find((c) => c.id === id)?.name ?? `#${id}`;

  return (
    <Panel title="Groups" actions={canWrite ? <Button variant="primary" size="sm" onClick={() => setEditing("new")}>New group</Button> : undefined}>
      {groups.isPending && <Loading label="Loading groups…" />}
      {groups.isError && <Notice tone="danger" title="Could not load the groups">{describeError(groups.error).message}</Notice>}
      {groups.data && groups.data.length === 0 && <p className="text-muted">No groups yet.</p>}
      <ul className="flex flex-col gap-2">
        {groups.data?.map((g) => (
          <li key={g.id} className="flex flex-wrap items-start justify-between gap-2 border-b border-line/60 pb-2 last:border-0">
            <div className="min-w-0">
              <p className="font-medium">{g.name}</p>
              {g.description && <p className="text-xs text-muted">{g.description}</p>}
              <p className="mt-0.5 text-sm">{g.contactIds.length ? g.contactIds.map(nameOf).join(", ") : <span className="text-muted">No members</span>}</p>
            </div>
            {canWrite && (
              <div className="flex gap-1">
                <Button size="sm" variant="ghost" onClick={() => setEditing(g)} aria-label={`Edit ${g.name}`}>
                  Edit
                </Button>
                <ConfirmDeleteButton id={g.id} what="Group" label={`Delete the group ${g.name}`} mutation={remove} />
              </div>
            )}
          </li>
        ))}
      </ul>
      {editing && <GroupDialog group={editing === "new" ? null : editing} contacts={contacts.data ?? []} onClose={() => setEditing(null)} />}
    </Panel>
  );
}
