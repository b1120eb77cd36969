import type { ReactNode } from "react";
import { SEVERITY_LEVELS } from "@shared/rules/severity.ts";
import { Button } from "@/components/ui/button.tsx";
import { useServerEventStatus } from "@/hooks/use-server-events.ts";
import { setAlertPreference, useAlertPreferences } from "../hooks/use-alert-preferences.ts";
import { hasFilters, NO_FILTERS, type FilterOption, type TimelineFilters } from "../timeline/timeline-filters.ts";

const STATE_OPTIONS: ReadonlyArray<{ value: string; label: string }> = [
  { value: "", label: "Any state" },
  { value: "active", label: "Open or acknowledged" },
  { value: "open", label: "Open" },
  { value: "acknowledged", label: "Acknowledged" },
  { value: "cleared", label: "Cleared" },
  { value: "expired", label: "Expired" },
  { value: "false-alarm", label: "False alarm" },
];

function Picker({ label, value, onChange, children }: { label: string; value: string; onChange: (value: string) => void; children: ReactNode }) {
  return (
    <label className="flex items-center gap-1.5 text-xs text-muted">
      <span>{label}</span>
      <select value={value} onChange={(event) => onChange(event.target.value)} className="h-7 max-w-48 rounded border border-line bg-canvas px-1.5 text-xs text-ink">
        {children}
      </select>
    </label>
  );
}

/**
 * A zone or rule filter. The options come from the loaded entries; an id from the URL that is not
 * among them (an older trigger's zone) is still listed, so the filter reads what it does.
 */
function IdPicker({
  label,
  anyLabel,
  unknownLabel,
  value,
  options,
  onChange,
}: {
  label: string;
  anyLabel: string;
  unknownLabel: string;
  value: number | null;
  options: readonly FilterOption[];
  onChange: (id: number | null) => void;
}) {
  return (
    <Picker label={label} value={String(value ?? "")} onChange={(next) => onChange(next === "" ? null : Number(next))}>
      <option value="">{anyLabel}</option>
      {value !== null && !options.some((option) => option.id === value) && <option value={value}>{`${unknownLabel} ${value}`}</option>}
      {options.map((option) => (
        <option key={option.id} value={option.id}>
          {option.label}
        </option>
      ))}
    </Picker>
  );
}

/** Whether live updates are arriving; a calm word, not an alarm, when the stream is reconnecting. */
function LiveDot() {
  const status = useServerEventStatus();
  const live = status === "open";
  return (
    <span className={`flex items-center gap-1.5 text-xs ${live ? "text-ok" : "text-caution"}`} title={live ? "New triggers appear here as they open." : "The list refreshes every two minutes until the live stream is back."}>
      <span aria-hidden="true" className={`inline-block h-2 w-2 rounded-full ${live ? "bg-ok" : "bg-caution"}`} />
      {live ? "Live" : "Reconnecting…"}
    </span>
  );
}

/** Filters (kept in the URL), the alert switches (kept in this browser) and the live state. */
export function TimelineToolbar({
  filters,
  onFilters,
  zones,
  rules,
}: {
  filters: TimelineFilters;
  onFilters: (next: TimelineFilters) => void;
  zones: readonly FilterOption[];
  rules: readonly FilterOption[];
}) {
  const preferences = useAlertPreferences();
  return (
    <div className="flex flex-wrap items-center gap-x-4 gap-y-2 rounded-t-md border border-b-0 border-line bg-surface px-3 py-2">
      <fieldset className="flex flex-wrap items-center gap-x-3 gap-y-2">
        <legend className="sr-only">Filter the timeline</legend>
        <Picker label="State" value={filters.state ?? ""} onChange={(value) => onFilters({ ...filters, state: (value || null) as TimelineFilters["state"] })}>
          {STATE_OPTIONS.map((option) => (
            <option key={option.value} value={option.value}>
              {option.label}
            </option>
          ))}
        </Picker>
        <Picker label="Severity" value={filters.severity ?? ""} onChange={(value) => onFilters({ ...filters, severity: (value || null) as TimelineFilters["severity"] })}>
          <option value="">Any severity</option>
          {SEVERITY_LEVELS.map((level) => (
            <option key={level.key} value={level.key}>
              {level.rank === 3 ? level.label : `${level.label} or higher`}
            </option>
          ))}
        </Picker>
        <IdPicker label="Zone" anyLabel="Any zone" unknownLabel="zone" value={filters.zoneId} options={zones} onChange={(zoneId) => onFilters({ ...filters, zoneId })} />
        <IdPicker label="Rule" anyLabel="Any rule" unknownLabel="rule" value={filters.ruleId} options={rules} onChange={(ruleId) => onFilters({ ...filters, ruleId })} />
        {hasFilters(filters) && (
          <Button size="sm" variant="ghost" onClick={() => onFilters(NO_FILTERS)}>
            Clear filters
          </Button>
        )}
      </fieldset>
      <div className="ml-auto flex items-center gap-4 text-xs">
        <label className="flex items-center gap-1.5">
          <input type="checkbox" checked={preferences.sound} onChange={(event) => setAlertPreference("sound", event.target.checked)} />
          Sound for new triggers
        </label>
        <label className="flex items-center gap-1.5">
          <input type="checkbox" checked={preferences.titleBadge} onChange={(event) => setAlertPreference("titleBadge", event.target.checked)} />
          Open count in tab title
        </label>
        <LiveDot />
      </div>
    </div>
  );
}
