import type { ZoneOption } from "./rule-editor-types.ts";

/**
 * The zones a rule watches, as checkboxes with code and name. Zones that cover no point of a stored
 * grid are flagged, because a rule can never fire there.
 */
export function ZonePicker({
  zones,
  value,
  onChange,
  error,
  disabled,
}: {
  zones: readonly ZoneOption[];
  value: readonly number[];
  onChange: (ids: number[]) => void;
  error?: string;
  disabled?: boolean;
}) {
  const chosen = new Set(value);
  const toggle = (id: number) => onChange(chosen.has(id) ? value.filter((v) => v !== id) : [...value, id]);
  return (
    <fieldset className="flex flex-col gap-1.5" aria-invalid={error ? true : undefined}>
      <legend className="mb-1 flex w-full items-center justify-between text-xs font-medium text-muted">
        <span>Zones</span>
        {!disabled && (
          <span className="flex gap-2">
            <button type="button" className="text-accent hover:underline" onClick={() => onChange(zones.map((z) => z.id))}>
              All
            </button>
            <button type="button" className="text-accent hover:underline" onClick={() => onChange([])}>
              None
            </button>
          </span>
        )}
      </legend>
      {zones.length === 0 && <p className="text-muted">No zones yet. Import or draw them on the Zones page.</p>}
      <div className="grid grid-cols-1 gap-x-4 gap-y-1 sm:grid-cols-2">
        {zones.map((zone) => (
          <label key={zone.id} className="flex items-baseline gap-2">
            <input type="checkbox" checked={chosen.has(zone.id)} onChange={() => toggle(zone.id)} disabled={disabled} />
            <span className="font-mono text-xs font-medium">{zone.code}</span>
            <span className="truncate">{zone.name}</span>
            {zone.coversNothing && <span className="text-xs text-danger">covers no grid point</span>}
          </label>
        ))}
      </div>
      {error && <p className="text-xs text-danger">{error}</p>}
    </fieldset>
  );
}
