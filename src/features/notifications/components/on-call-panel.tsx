import { useMemo, useState } from "react";
import type { ShiftDto } from "@shared/api/notifications.ts";
import { Button } from "@/components/ui/button.tsx";
import { Chip } from "@/components/ui/chip.tsx";
import { Loading } from "@/components/ui/loading.tsx";
import { Notice } from "@/components/ui/notice.tsx";
import { Panel } from "@/components/ui/panel.tsx";
import { Timestamp } from "@/components/ui/timestamp.tsx";
import { useNow } from "@/hooks/use-now.ts";
import { describeError } from "@/lib/describe-error.ts";
import { useContacts } from "../api/contacts.ts";
import { useDeleteShift, useShifts } from "../api/on-call.ts";
import { ConfirmDeleteButton } from "./confirm-delete-button.tsx";
import { ShiftDialog } from "./shift-dialog.tsx";

const DAY = 86_400_000;

/** The schedule from yesterday to a week ahead, grouped by UTC day, with who is on shift now. */
export function OnCallPanel({ canWrite }: { canWrite: boolean }) {
  const now = useNow(60_000);
  const span = useMemo(() => {
    const start = Math.floor(Date.now() / DAY) * DAY - DAY;
    return { from: new Date(start).toISOString(), to: new Date(start + 9 * DAY).toISOString() };
  }, []);
  const shifts = useShifts(span.from, span.to);
  const contacts = useContacts(canWrite);
  const remove = useDeleteShift();
  const [editing, setEditing] = useState<ShiftDto | "new" | null>(null);

  const nowIso = now.toISOString();
  const current = (shifts.data ?? []).filter((s) => s.startsAt <= nowIso && s.endsAt > nowIso);
  const byDay = new Map<string, ShiftDto[]>();
  for (const s of shifts.data ?? []) byDay.set(s.startsAt.slice(0, 10), [...(byDay.get(s.startsAt.slice(0, 10)) ?? []), s]);

  return (
    <div className="flex flex-col gap-4">
      <Panel title="On shift now">
        {current.length === 0 ? (
          <Notice tone="caution" title="Nobody is on shift">
            Rules that notify “whoever is on shift” reach nobody until a shift covers this moment; their triggers are marked as not notified.
          </Notice>
        ) : (
          <ul className="flex flex-wrap gap-2" data-testid="on-shift-now">
            {current.map((s) => (
              <li key={s.id} className="rounded border border-line px-2 py-1">
                <span className="font-medium">{s.contactName}</span> <Chip tone={s.role === "lead" ? "accent" : "neutral"}>{s.role}</Chip>
                <span className="ml-1 text-xs text-muted">until <Timestamp value={s.endsAt} /></span>
              </li>
            ))}
          </ul>
        )}
      </Panel>
      <Panel title="Schedule (UTC days)" actions={canWrite ? <Button variant="primary" size="sm" onClick={() => setEditing("new")}>New shift</Button> : undefined}>
        {shifts.isPending && <Loading label="Loading the schedule…" />}
        {shifts.isError && <Notice tone="danger" title="Could not load the schedule">{describeError(shifts.error).message}</Notice>}
        {shifts.data && shifts.data.length === 0 && <p className="text-muted">No shifts from yesterday to next week.</p>}
        {[...byDay.entries()].map(([day, list]) => (
          <section key={day} className="mb-3">
            <h3 className="mb-1 font-mono text-xs text-muted">{day}</h3>
            <ul className="flex flex-col">
              {list.map((s) => {
                const live = s.startsAt <= nowIso && s.endsAt > nowIso;
                return (
                  <li key={s.id} className={`flex flex-wrap items-center gap-x-3 gap-y-1 border-b border-line/60 py-1.5 last:border-0 ${live ? "bg-accent/5" : ""}`}>
                    <span className="min-w-48 font-medium">{s.contactName}</span>
                    <Chip tone={s.role === "lead" ? "accent" : "neutral"}>{s.role}</Chip>
                    <span className="text-xs">
                      <Timestamp value={s.startsAt} /> → <Timestamp value={s.endsAt} />
                    </span>
                    {s.note && <span className="text-xs text-muted">{s.note}</span>}
                    {live && <Chip tone="ok">now</Chip>}
                    {canWrite && (
                      <span className="ml-auto flex gap-1">
                        <Button size="sm" variant="ghost" onClick={() => setEditing(s)} aria-label={`Edit the shift of ${s.contactName} from ${s.startsAt}`}>
                          Edit
                        </Button>
                        <ConfirmDeleteButton id={s.id} what="Shift" label={`Delete the shift of ${s.contactName} from ${s.startsAt}`} mutation={remove} />
                      </span>
                    )}
                  </li>
                );
              })}
            </ul>
          </section>
        ))}
      </Panel>
      {editing && contacts.data && (
        <ShiftDialog shift={editing === "new" ? null : editing} contacts={contacts.data} defaultStart={new Date(Math.ceil(Date.now() / 3_600_000) * 3_600_000)} onClose={() => setEditing(null)} />
      )}
    </div>
  );
}
