import { useState, type FormEvent } from "react";
import type { HistoryFilters as Filters } from "@shared/api/history.ts";
import { TRIGGER_STATES } from "@shared/api/triggers.ts";
import { SEVERITY_LEVELS } from "@shared/rules/index.ts";
import { Button } from "@/components/ui/button.tsx";
import { SelectField } from "@/components/ui/select-field.tsx";
import { TextField } from "@/components/ui/text-field.tsx";
import { isoToUtcInput, utcInputToIso } from "@/lib/time.ts";
import { RuleVersionSelects } from "./rule-version-selects.tsx";
import { useFilterOptions } from "../api/get-filter-options.ts";
import { TRIGGER_STATE_LABELS } from "./trigger-state-label.tsx";

interface Draft {
  from: string;
  to: string;
  ruleId: string;
  ruleVersionId: string;
  zoneId: string;
  severity: string;
  state: string;
  acknowledgedBy: string;
}

const draftOf = (f: Filters): Draft => ({
  from: isoToUtcInput(f.from),
  to: isoToUtcInput(f.to),
  ruleId: f.ruleId ? String(f.ruleId) : "",
  ruleVersionId: f.ruleVersionId ? String(f.ruleVersionId) : "",
  zoneId: f.zoneId ? String(f.zoneId) : "",
  severity: f.severity ?? "",
  state: f.state ?? "",
  acknowledgedBy: f.acknowledgedBy ?? "",
});

const numberOrUndefined = (value: string) => (value ? Number(value) : undefined);

/** The history's filters. The period is when triggers opened, entered in UTC. */
export function HistoryFilters({ value, acknowledgers, onApply }: { value: Filters; acknowledgers: readonly string[]; onApply: (filters: Filters) => void }) {
  const [draft, setDraft] = useState<Draft>(() => draftOf(value));
  const [rangeError, setRangeError] = useState<string | null>(null);
  const options = useFilterOptions();
  const set = (key: keyof Draft) => (event: { target: { value: string } }) =>
    setDraft((d) => ({ ...d, [key]: event.target.value }));

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const from = draft.from ? utcInputToIso(draft.from) : null;
    const to = draft.to ? utcInputToIso(draft.to) : null;
    if ((draft.from && !from) || (draft.to && !to)) return setRangeError("Enter times as a date and a UTC time.");
    if (from && to && from > to) return setRangeError("“From” is later than “To”.");
    setRangeError(null);
    onApply({
      from: from ?? undefined,
      to: to ?? undefined,
      ruleId: numberOrUndefined(draft.ruleId),
      ruleVersionId: numberOrUndefined(draft.ruleVersionId),
      zoneId: numberOrUndefined(draft.zoneId),
      severity: (draft.severity || undefined) as Filters["severity"],
      state: (draft.state || undefined) as Filters["state"],
      acknowledgedBy: draft.acknowledgedBy || undefined,
    });
  };

  const clear = () => {
    setDraft(draftOf({}));
    setRangeError(null);
    onApply({});
  };

  return (
    <form onSubmit={submit} aria-label="History filters" className="mb-3 rounded-md border border-line bg-surface p-3 print:hidden">
      <div className="grid grid-cols-2 gap-3 md:grid-cols-4 xl:grid-cols-8">
        <TextField label="Opened from (UTC)" type="datetime-local" value={draft.from} onChange={set("from")} error={rangeError ?? undefined} />
        <TextField label="Opened to (UTC)" type="datetime-local" value={draft.to} onChange={set("to")} />
        <RuleVersionSelects
          ruleId={draft.ruleId}
          versionId={draft.ruleVersionId}
          everyRuleLabel="Every rule"
          onRule={(ruleId) => setDraft((d) => ({ ...d, ruleId, ruleVersionId: "" }))}
          onVersion={(ruleVersionId) => setDraft((d) => ({ ...d, ruleVersionId }))}
        />
        <SelectField label="Zone" value={draft.zoneId} onChange={set("zoneId")}>
          <option value="">Every zone</option>
          {options.data?.zones.map((z) => (
            <option key={z.id} value={z.id}>
              {z.code} — {z.name}
            </option>
          ))}
        </SelectField>
        <SelectField label="Severity" value={draft.severity} onChange={set("severity")}>
          <option value="">Any severity</option>
          {SEVERITY_LEVELS.map((s) => (
            <option key={s.key} value={s.key}>
              {s.label}
            </option>
          ))}
        </SelectField>
        <SelectField label="State" value={draft.state} onChange={set("state")}>
          <option value="">Any state</option>
          {TRIGGER_STATES.map((s) => (
            <option key={s} value={s}>
              {TRIGGER_STATE_LABELS[s]}
            </option>
          ))}
        </SelectField>
        <SelectField label="Acknowledged by" value={draft.acknowledgedBy} onChange={set("acknowledgedBy")}>
          <option value="">Anyone or nobody</option>
          <option value="none">Nobody (never acknowledged)</option>
          {acknowledgers.map((who) => (
            <option key={who} value={who}>
              {who}
            </option>
          ))}
        </SelectField>
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
