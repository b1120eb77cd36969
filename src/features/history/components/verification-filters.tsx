import { useState, type FormEvent } from "react";
import { DEFAULT_DISTANCE_KM, SPACE_MODES, type SpaceMode, type VerificationQuery } from "@shared/api/verification.ts";
import { STORM_REPORT_KIND_LABELS, STORM_REPORT_KINDS, type StormReportKind } from "@shared/storm-reports/storm-report-kinds.ts";
import { Button } from "@/components/ui/button.tsx";
import { SelectField } from "@/components/ui/select-field.tsx";
import { TextField } from "@/components/ui/text-field.tsx";
import { isoToUtcInput, utcInputToIso } from "@/lib/time.ts";
import { RuleVersionSelects } from "./rule-version-selects.tsx";

const SPACE_LABELS: Record<SpaceMode, string> = { zone: "Inside the trigger's zone", area: "Near the area where the rule matched" };

interface Draft {
  from: string;
  to: string;
  ruleId: string;
  ruleVersionId: string;
  space: SpaceMode;
  distanceKm: string;
  windowHours: string;
  kinds: StormReportKind[];
}

const draftOf = (q: VerificationQuery): Draft => ({
  from: isoToUtcInput(q.from),
  to: isoToUtcInput(q.to),
  ruleId: q.ruleId ? String(q.ruleId) : "",
  ruleVersionId: q.ruleVersionId ? String(q.ruleVersionId) : "",
  space: q.space,
  distanceKm: q.distanceKm === undefined ? "" : String(q.distanceKm),
  windowHours: String(q.windowHours),
  kinds: q.kinds && q.kinds.length > 0 ? q.kinds : [...STORM_REPORT_KINDS],
});

/** What to score and how reports are matched: the period (valid times, UTC), the rule or version, the matching choices. */
export function VerificationFilters({ value, onApply }: { value: VerificationQuery; onApply: (query: VerificationQuery) => void }) {
  const [draft, setDraft] = useState<Draft>(() => draftOf(value));
  const [error, setError] = useState<string | null>(null);
  const set = (key: keyof Draft) => (event: { target: { value: string } }) =>
    setDraft((d) => ({ ...d, [key]: event.target.value }));
  const toggleKind = (kind: StormReportKind) =>
    setDraft((d) => ({ ...d, kinds: d.kinds.includes(kind) ? d.kinds.filter((k) => k !== kind) : STORM_REPORT_KINDS.filter((k) => k === kind || d.kinds.includes(k)) }));

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const from = utcInputToIso(draft.from);
    const to = utcInputToIso(draft.to);
    if (!from || !to) return setError("Enter both ends of the period as a date and a UTC time.");
    if (from >= to) return setError("“From” must be earlier than “To”.");
    if (draft.kinds.length === 0) return setError("Pick at least one kind of report.");
    const distance = draft.distanceKm.trim() === "" ? undefined : Number(draft.distanceKm);
    const window = Number(draft.windowHours);
    if (distance !== undefined && !(distance >= 0 && distance <= 300)) return setError("The distance is 0 to 300 km.");
    if (!(window >= 0 && window <= 48)) return setError("The time window is 0 to 48 hours.");
    setError(null);
    onApply({
      from,
      to,
      ruleId: draft.ruleId ? Number(draft.ruleId) : undefined,
      ruleVersionId: draft.ruleVersionId ? Number(draft.ruleVersionId) : undefined,
      space: draft.space,
      distanceKm: distance,
      windowHours: window,
      kinds: draft.kinds,
    });
  };

  return (
    <form onSubmit={submit} aria-label="Verification settings" className="mb-4 rounded-md border border-line bg-surface p-3">
      <div className="grid grid-cols-2 gap-3 md:grid-cols-4">
        <TextField label="Valid from (UTC)" type="datetime-local" value={draft.from} onChange={set("from")} error={error ?? undefined} />
        <TextField label="Valid to (UTC)" type="datetime-local" value={draft.to} onChange={set("to")} />
        <RuleVersionSelects
          ruleId={draft.ruleId}
          versionId={draft.ruleVersionId}
          everyRuleLabel="Every rule together"
          onRule={(ruleId) => setDraft((d) => ({ ...d, ruleId, ruleVersionId: "" }))}
          onVersion={(ruleVersionId) => setDraft((d) => ({ ...d, ruleVersionId }))}
        />
        <SelectField label="A report counts when it lies" value={draft.space} onChange={set("space")}>
          {SPACE_MODES.map((mode) => (
            <option key={mode} value={mode}>
              {SPACE_LABELS[mode]}
            </option>
          ))}
        </SelectField>
        <TextField
          label="…or within (km)"
          type="number"
          min={0}
          max={300}
          step="any"
          inputMode="decimal"
          placeholder={String(DEFAULT_DISTANCE_KM[draft.space])}
          hint={draft.space === "zone" ? "Beyond the zone's edge; 0 = inside or on the edge" : "Of a matched grid point"}
          value={draft.distanceKm}
          onChange={set("distanceKm")}
        />
        <TextField label="Time window (hours)" type="number" min={0} max={48} step="any" inputMode="decimal" hint="Before the first and after the last valid time" value={draft.windowHours} onChange={set("windowHours")} />
        <fieldset className="flex flex-col gap-1">
          <legend className="text-xs font-medium text-muted">Kinds of report</legend>
          <div className="flex h-9 items-center gap-3">
            {STORM_REPORT_KINDS.map((kind) => (
              <label key={kind} className="flex items-center gap-1.5">
                <input type="checkbox" checked={draft.kinds.includes(kind)} onChange={() => toggleKind(kind)} />
                {STORM_REPORT_KIND_LABELS[kind]}
              </label>
            ))}
          </div>
        </fieldset>
      </div>
      <div className="mt-3">
        <Button type="submit" variant="primary" size="sm">
          Score
        </Button>
      </div>
    </form>
  );
}
