import type { FieldValues } from "./field-values.ts";
import { formatLatLon } from "./format-lat-lon.ts";
import { formatMapValue, type MapField } from "./map-fields.ts";
import type { MapPoint } from "./map-pointer-surface.tsx";

/** The value under the pointer in display units, where it is, and which grid point it belongs to. */
export function MapReadout({ field, values, point }: { field: MapField | null; values: FieldValues | null; point: MapPoint | null }) {
  if (!point) {
    return (
      <p data-testid="map-readout" className="h-6 text-xs text-muted">
        Point at the map to read a value. Click (or press Enter on the focused map) to open the sounding at that point.
      </p>
    );
  }
  const value = values ? values.values[point.j * values.nx + point.i]! : Number.NaN;
  return (
    <p data-testid="map-readout" className="flex h-6 flex-wrap items-baseline gap-x-4 font-mono text-xs tabular-nums">
      {field && (
        <span>
          <span className="text-muted">{field.key} </span>
          <span className="font-semibold text-ink">{formatMapValue(field, value)}</span>
        </span>
      )}
      <span>{formatLatLon(point.lat, point.lon)}</span>
      <span className="text-muted">
        i {point.i} · j {point.j}
      </span>
    </p>
  );
}
