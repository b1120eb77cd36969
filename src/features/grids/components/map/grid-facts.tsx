import type { GridGeometry } from "@shared/grid/geometry-types.ts";
import { Panel } from "@/components/ui/panel.tsx";
import { formatNumber } from "@/lib/format-units.ts";
import type { MapFrame } from "../../api/get-frame.ts";

function projectionName(geometry: GridGeometry): string {
  switch (geometry.kind) {
    case "latlon":
      return "Regular latitude–longitude";
    case "lambert":
      return `Lambert conformal (true at ${formatNumber(geometry.latin1, 1)}°${geometry.latin2 !== geometry.latin1 ? ` and ${formatNumber(geometry.latin2, 1)}°` : ""})`;
    case "polar":
      return `Polar stereographic (${geometry.southPole ? "south" : "north"})`;
  }
}

function spacing(geometry: GridGeometry): string {
  if (geometry.kind === "latlon") return `${formatNumber(geometry.dlon, 3)}° × ${formatNumber(geometry.dlat, 3)}°`;
  return `${formatNumber(geometry.dx / 1000, 1)} × ${formatNumber(geometry.dy / 1000, 1)} km`;
}

/** The grid behind the map, in a few lines. */
export function GridFacts({ frame }: { frame: MapFrame }) {
  const { geometry } = frame;
  const rows: Array<[string, string]> = [
    ["Projection", projectionName(geometry)],
    ["Points", `${formatNumber(geometry.nx)} × ${formatNumber(geometry.ny)}`],
    ["Spacing", spacing(geometry)],
    ["Levels", frame.levels.length > 0 ? `${frame.levels.length} isobaric, ${formatNumber(Math.max(...frame.levels) / 100)}–${formatNumber(Math.min(...frame.levels) / 100)} hPa` : "none"],
  ];
  return (
    <Panel title="Grid">
      <dl className="grid grid-cols-[auto_1fr] gap-x-3 gap-y-1 text-xs">
        {rows.map(([term, value]) => (
          <div key={term} className="contents">
            <dt className="text-muted">{term}</dt>
            <dd>{value}</dd>
          </div>
        ))}
      </dl>
    </Panel>
  );
}
