import { FIELDS, fieldByKey } from "@shared/fields.ts";
import { SelectField } from "@/components/ui/select-field.tsx";
import { formatStorageUnit } from "@/lib/format-units.ts";
import { NumberField } from "./number-field.tsx";
import type { RuleFormInput } from "./rule-form-values.ts";

type SpatialCondition = RuleFormInput["spatialCondition"];
type Kind = SpatialCondition["kind"];

const KIND_LABELS: Record<Kind, string> = {
  "any-point": "Any grid point in the zone",
  "min-points": "At least N grid points",
  "min-coverage": "At least P % of the zone",
  "zone-extreme": "Zone maximum or minimum of a field",
};

/** Sensible starting values when the kind changes, so the form never holds half a condition. */
function startingCondition(kind: Kind): SpatialCondition {
  switch (kind) {
    case "any-point":
      return { kind };
    case "min-points":
      return { kind, points: 3 };
    case "min-coverage":
      return { kind, percent: 10 };
    case "zone-extreme":
      return { kind, statistic: "max", field: "mlcape", comparison: ">=", value: 2000 };
  }
}

const NUMBER_FIELDS = FIELDS.filter((f) => f.kind === "number");

/** How much of a zone must match before the rule counts as met there. */
export function SpatialConditionFields({
  value,
  onChange,
  errors,
  disabled,
}: {
  value: SpatialCondition;
  onChange: (next: SpatialCondition) => void;
  errors: Record<string, string>;
  disabled?: boolean;
}) {
  return (
    <div className="flex flex-col gap-2">
      <SelectField label="Spatial condition" value={value.kind} disabled={disabled} onChange={(e) => onChange(startingCondition(e.target.value as Kind))}>
        {(Object.keys(KIND_LABELS) as Kind[]).map((kind) => (
          <option key={kind} value={kind}>
            {KIND_LABELS[kind]}
          </option>
        ))}
      </SelectField>
      {value.kind === "min-points" && (
        <NumberField label="Grid points (N)" integer value={value.points} disabled={disabled} error={errors.points} onChange={(points) => onChange({ ...value, points })} />
      )}
      {value.kind === "min-coverage" && (
        <NumberField
          label="Coverage (P %)"
          value={value.percent}
          disabled={disabled}
          error={errors.percent}
          hint="Matched points as a share of the zone's points that have data."
          onChange={(percent) => onChange({ ...value, percent })}
        />
      )}
      {value.kind === "zone-extreme" && <ZoneExtremeFields value={value} onChange={onChange} errors={errors} disabled={disabled} />}
    </div>
  );
}

function ZoneExtremeFields({
  value,
  onChange,
  errors,
  disabled,
}: {
  value: Extract<SpatialCondition, { kind: "zone-extreme" }>;
  onChange: (next: SpatialCondition) => void;
  errors: Record<string, string>;
  disabled?: boolean;
}) {
  const field = fieldByKey(value.field);
  const unit = field ? formatStorageUnit(field.unit) : "";
  return (
    <div className="grid grid-cols-2 gap-2">
      <SelectField label="Statistic" value={value.statistic} disabled={disabled} onChange={(e) => onChange({ ...value, statistic: e.target.value as "max" | "min" })}>
        <option value="max">Maximum over the matched points</option>
        <option value="min">Minimum over the matched points</option>
      </SelectField>
      <SelectField label="Field" value={value.field} disabled={disabled} error={errors.field} onChange={(e) => onChange({ ...value, field: e.target.value })}>
        {NUMBER_FIELDS.map((f) => (
          <option key={f.key} value={f.key}>
            {f.key}
          </option>
        ))}
      </SelectField>
      <SelectField label="Comparison" value={value.comparison} disabled={disabled} onChange={(e) => onChange({ ...value, comparison: e.target.value as typeof value.comparison })}>
        {([">=", ">", "<=", "<"] as const).map((op) => (
          <option key={op} value={op}>
            {op}
          </option>
        ))}
      </SelectField>
      <NumberField
        label={`Value${unit ? ` (${unit})` : ""}`}
        value={value.value}
        disabled={disabled}
        error={errors.value}
        hint={field && field.display.unit && field.display.unit !== unit ? `In ${unit || "stored units"}, not ${field.display.unit}.` : undefined}
        onChange={(v) => onChange({ ...value, value: v })}
      />
    </div>
  );
}
