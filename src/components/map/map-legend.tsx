import { formatNumber } from "@/lib/format-units.ts";
import { tickDecimals, type CategoricalScale, type ColourScale, type RampScale } from "./colour-scale.ts";
import type { MapField } from "./map-fields.ts";
import { MAP_GROUND } from "./map-stage.tsx";

function RampLegend({ field, scale }: { field: MapField; scale: RampScale }) {
  const stops = Array.from({ length: 16 }, (_, k) => `${scale.interpolator(k / 15)} ${((k / 15) * 100).toFixed(1)}%`).join(", ");
  const decimals = tickDecimals(scale.ticks);
  return (
    <div>
      <div className="h-3 rounded-sm border border-line" style={{ background: `linear-gradient(to right, ${stops})` }} />
      <div className="relative mt-1 h-4 font-mono text-[11px] text-muted tabular-nums">
        {scale.ticks.map((tick) => (
          <span
            key={tick.display}
            className="absolute -translate-x-1/2 whitespace-nowrap first:translate-x-0 last:-translate-x-full"
            style={{ left: `${tick.at * 100}%` }}
          >
            {formatNumber(tick.display, decimals)}
          </span>
        ))}
      </div>
      <p className="mt-0.5 text-xs text-muted">
        {scale.kind === "sequential" ? "Sequential scale" : field.neverPositive ? "Diverging scale, negative half (zero is neutral)" : "Diverging scale centred on zero"}
        {field.display.unit ? <>, in <span className="font-medium text-ink">{field.display.unit}</span></> : ", no unit"}. Values past either end take the end colour.
      </p>
    </div>
  );
}

function CategoryLegend({ scale }: { scale: CategoricalScale }) {
  return (
    <ul className="flex flex-wrap gap-x-3 gap-y-1 text-xs">
      {scale.entries.map((entry) => (
        <li key={entry.code} className="flex items-center gap-1.5">
          <span
            aria-hidden="true"
            className="inline-block h-3 w-3 rounded-sm border border-line"
            style={{ background: entry.colour ?? "transparent" }}
          />
          <span>{entry.label.replaceAll("_", " ")}</span>
          {!entry.colour && <span className="text-muted">(clear)</span>}
        </li>
      ))}
    </ul>
  );
}

/** The colour key of the shown field, in display units. */
export function MapLegend({ field, scale, missingCount }: { field: MapField; scale: ColourScale; missingCount: number }) {
  return (
    <section aria-label="Legend" className="flex flex-col gap-1.5">
      <h3 className="text-xs font-semibold">
        <span className="font-mono">{field.key}</span>
        {field.display.unit && <span className="font-normal text-muted"> · {field.display.unit}</span>}
      </h3>
      {scale.kind === "categorical" ? <CategoryLegend scale={scale} /> : <RampLegend field={field} scale={scale} />}
      {missingCount > 0 && (
        <p className="flex items-center gap-1.5 text-xs text-muted">
          <span aria-hidden="true" className="inline-block h-3 w-3 rounded-sm border border-line" style={{ background: MAP_GROUND }} />
          No value at {formatNumber(missingCount)} grid points (left clear)
        </p>
      )}
    </section>
  );
}
