import { SelectField } from "@/components/ui/select-field.tsx";
import { NumberField } from "./number-field.tsx";
import type { RuleFormInput } from "./rule-form-values.ts";

type ValidTimeWindow = RuleFormInput["validTimeWindow"];
type Kind = ValidTimeWindow["kind"];

const KIND_LABELS: Record<Kind, string> = {
  "any-time": "Any valid time",
  "forecast-hours": "Forecast hours",
  "clock-hours-utc": "Clock hours (UTC)",
};

function startingWindow(kind: Kind): ValidTimeWindow {
  if (kind === "forecast-hours") return { kind, fromHour: 0, toHour: 18 };
  if (kind === "clock-hours-utc") return { kind, fromHour: 18, toHour: 6 };
  return { kind };
}

/** Which valid times the rule looks at: all, a range of forecast hours, or UTC clock hours (may wrap past midnight). */
export function ValidTimeWindowFields({
  value,
  onChange,
  errors,
  disabled,
}: {
  value: ValidTimeWindow;
  onChange: (next: ValidTimeWindow) => void;
  errors: Record<string, string>;
  disabled?: boolean;
}) {
  return (
    <div className="flex flex-col gap-2">
      <SelectField label="Valid times" value={value.kind} disabled={disabled} onChange={(e) => onChange(startingWindow(e.target.value as Kind))}>
        {(Object.keys(KIND_LABELS) as Kind[]).map((kind) => (
          <option key={kind} value={kind}>
            {KIND_LABELS[kind]}
          </option>
        ))}
      </SelectField>
      {value.kind !== "any-time" && (
        <div className="grid grid-cols-2 gap-2">
          <NumberField
            label={value.kind === "forecast-hours" ? "From forecast hour" : "From hour (UTC)"}
            integer
            value={value.fromHour}
            disabled={disabled}
            error={errors.fromHour}
            onChange={(fromHour) => onChange({ ...value, fromHour })}
          />
          <NumberField
            label={value.kind === "forecast-hours" ? "To forecast hour" : "To hour (UTC)"}
            integer
            value={value.toHour}
            disabled={disabled}
            error={errors.toHour}
            hint={value.kind === "clock-hours-utc" ? "Inclusive; a range like 18 to 6 runs past midnight." : "Inclusive."}
            onChange={(toHour) => onChange({ ...value, toHour })}
          />
        </div>
      )}
    </div>
  );
}
