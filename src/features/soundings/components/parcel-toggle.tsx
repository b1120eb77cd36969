import { useId } from "react";
import { PARCEL_SHORTCUT } from "../hooks/use-parcel-shortcut.ts";
import { PARCEL_IDS, PARCEL_NAMES, PARCEL_ORIGINS, PARCEL_TAGS, type ParcelId } from "../parcels.ts";

/** Chooses whose CAPE and CIN the skew-T shades: a radio group drawn as a segmented control. */
export function ParcelToggle({ value, onChange }: { value: ParcelId; onChange: (id: ParcelId) => void }) {
  const name = useId();
  return (
    <fieldset className="flex flex-wrap items-center gap-2">
      <legend className="sr-only">Parcel whose CAPE and CIN are shaded</legend>
      <span aria-hidden="true" className="text-xs text-muted">
        Shade areas of
      </span>
      <div className="inline-flex overflow-hidden rounded border border-line">
        {PARCEL_IDS.map((id) => (
          <label
            key={id}
            title={`${PARCEL_TAGS[id]}: ${PARCEL_NAMES[id]} parcel, ${PARCEL_ORIGINS[id]}`}
            className={`cursor-pointer border-line px-2.5 py-1 text-xs font-medium not-first:border-l has-[:focus-visible]:outline-2 has-[:focus-visible]:outline-focus ${
              id === value ? "bg-accent text-accent-ink" : "bg-raised text-ink hover:bg-surface"
            }`}
          >
            <input type="radio" name={name} value={id} checked={id === value} onChange={() => onChange(id)} className="sr-only" />
            {PARCEL_TAGS[id]}
            <span className="sr-only"> ({PARCEL_NAMES[id]} parcel)</span>
          </label>
        ))}
      </div>
      <span className="text-xs text-muted">
        or press <kbd className="rounded border border-line bg-raised px-1 font-mono">{PARCEL_SHORTCUT}</kbd>
      </span>
    </fieldset>
  );
}
