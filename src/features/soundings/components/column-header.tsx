import type { ReactNode } from "react";
import type { ColumnAtPointDto } from "@shared/api/soundings.ts";
import { Panel } from "@/components/ui/panel.tsx";
import { Timestamp } from "@/components/ui/timestamp.tsx";
import { formatNumber } from "@/lib/format-units.ts";

/** "35.2500° N, 97.5000° W" */
export function formatLatLon(lat: number, lon: number): string {
  const east = ((lon + 540) % 360) - 180;
  return `${Math.abs(lat).toFixed(4)}° ${lat >= 0 ? "N" : "S"}, ${Math.abs(east).toFixed(4)}° ${east >= 0 ? "E" : "W"}`;
}

function Entry({ label, children }: { label: string; children: ReactNode }) {
  return (
    <div className="flex flex-col gap-0.5">
      <dt className="text-xs text-muted">{label}</dt>
      <dd>{children}</dd>
    </div>
  );
}

/** Which model column this is: model, run and valid time (UTC first, local beside), and the grid point used. */
export function ColumnHeader({ column, requested }: { column: ColumnAtPointDto; requested: { lat: number; lon: number } }) {
  const { frame, point } = column;
  return (
    <Panel title="Model column">
      <dl className="grid gap-x-6 gap-y-3 sm:grid-cols-2 xl:grid-cols-4" data-testid="column-header">
        <Entry label="Model">
          <span className="font-medium">{frame.model}</span>
        </Entry>
        <Entry label="Run (UTC · local)">
          <Timestamp value={frame.runTime} />
        </Entry>
        <Entry label={`Valid, forecast hour ${formatNumber(frame.forecastHour)} (UTC · local)`}>
          <Timestamp value={frame.validTime} />
        </Entry>
        <Entry label="Grid point (nearest to the requested point)">
          <span className="font-mono text-xs [font-variant-ligatures:none]">
            i {point.i}, j {point.j} · {formatLatLon(point.lat, point.lon)}
          </span>
          <span className="block text-xs text-muted">requested {formatLatLon(requested.lat, requested.lon)}</span>
        </Entry>
      </dl>
    </Panel>
  );
}
