import { SEVERITY_LEVELS, type Severity } from "@shared/rules/index.ts";
import { SeverityChip } from "@/components/ui/severity-chip.tsx";

/** Bellwether's three severities as radio buttons, each with its chip and what it asks of the forecaster. */
export function SeverityPicker({ value, onChange, disabled }: { value: Severity; onChange: (severity: Severity) => void; disabled?: boolean }) {
  return (
    <fieldset className="flex flex-col gap-1">
      <legend className="mb-1 text-xs font-medium text-muted">Severity</legend>
      {SEVERITY_LEVELS.map((level) => (
        <label key={level.key} className="flex items-start gap-2">
          <input type="radio" name="severity" className="mt-1" value={level.key} checked={value === level.key} disabled={disabled} onChange={() => onChange(level.key)} />
          <span className="flex flex-col">
            <SeverityChip severity={level.key} className="self-start" />
            <span className="text-xs text-muted">{level.meaning}</span>
          </span>
        </label>
      ))}
    </fieldset>
  );
}
