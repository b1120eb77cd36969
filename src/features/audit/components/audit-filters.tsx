import { useState, type FormEvent } from "react";
import { Button } from "@/components/ui/button.tsx";
import { TextField } from "@/components/ui/text-field.tsx";
import { isoToUtcInput, utcInputToIso } from "@/lib/time.ts";
import type { AuditFilters as Filters } from "../audit-search-params.ts";

interface Draft {
  action: string;
  actor: string;
  targetType: string;
  from: string;
  to: string;
}

function draftOf(filters: Filters): Draft {
  return {
    action: filters.action ?? "",
    actor: filters.actor ?? "",
    targetType: filters.targetType ?? "",
    from: isoToUtcInput(filters.from),
    to: isoToUtcInput(filters.to),
  };
}

/** Filter form. Times are entered in UTC, as staff speak them. */
export function AuditFilters({ value, onApply }: { value: Filters; onApply: (filters: Filters) => void }) {
  const [draft, setDraft] = useState<Draft>(() => draftOf(value));
  const [rangeError, setRangeError] = useState<string | null>(null);
  const set = (key: keyof Draft) => (event: { target: { value: string } }) => setDraft((d) => ({ ...d, [key]: event.target.value }));

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const from = draft.from ? utcInputToIso(draft.from) : null;
    const to = draft.to ? utcInputToIso(draft.to) : null;
    if ((draft.from && !from) || (draft.to && !to)) {
      setRangeError("Enter times as a date and a UTC time.");
      return;
    }
    if (from && to && from > to) {
      setRangeError("“From” is later than “To”.");
      return;
    }
    setRangeError(null);
    onApply({ action: draft.action, actor: draft.actor, targetType: draft.targetType, from: from ?? undefined, to: to ?? undefined });
  };

  const clear = () => {
    setDraft(draftOf({}));
    setRangeError(null);
    onApply({});
  };

  return (
    <form onSubmit={submit} aria-label="Audit filters" className="mb-3 rounded-md border border-line bg-surface p-3">
      <div className="grid grid-cols-2 gap-3 md:grid-cols-3 xl:grid-cols-5">
        <TextField label="Action" mono placeholder="user." hint="Matches the start of the action" value={draft.action} onChange={set("action")} />
        <TextField label="Actor" mono placeholder="username" hint="Exact username" value={draft.actor} onChange={set("actor")} />
        <TextField label="Target type" mono placeholder="user" value={draft.targetType} onChange={set("targetType")} />
        <TextField label="From (UTC)" type="datetime-local" value={draft.from} onChange={set("from")} error={rangeError ?? undefined} />
        <TextField label="To (UTC)" type="datetime-local" value={draft.to} onChange={set("to")} />
      </div>
      <div className="mt-3 flex gap-2">
        <Button type="submit" variant="primary" size="sm">
          Apply filters
        </Button>
        <Button size="sm" onClick={clear}>
          Clear
        </Button>
      </div>
    </form>
  );
}
