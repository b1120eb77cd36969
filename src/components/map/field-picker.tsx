import { useId } from "react";
import type { MapField, MapFieldGroupList } from "./map-fields.ts";

/** The field to draw, grouped by theme, with the chosen field's plain meaning underneath. */
export function FieldPicker({ groups, value, onChange }: { groups: readonly MapFieldGroupList[]; value: string; onChange: (key: string) => void }) {
  const id = useId();
  const chosen: MapField | undefined = groups.flatMap((group) => group.fields).find((field) => field.key === value);
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="text-xs font-medium text-muted">
        Field
      </label>
      <select
        id={id}
        value={value}
        onChange={(event) => onChange(event.target.value)}
        aria-describedby={`${id}-meaning`}
        className="h-9 rounded border border-line bg-canvas px-2 font-mono text-sm text-ink"
      >
        {groups.map((group) => (
          <optgroup key={group.group} label={group.label}>
            {group.fields.map((field) => (
              <option key={field.key} value={field.key}>
                {field.label}
              </option>
            ))}
          </optgroup>
        ))}
      </select>
      <p id={`${id}-meaning`} className="min-h-10 text-xs text-muted">
        {chosen?.meaning}
      </p>
    </div>
  );
}
