import { Link } from "react-router-dom";
import type { RunDto } from "@shared/api/grids.ts";
import { gridFramePath } from "@/config/paths.ts";
import { formatCount } from "@/lib/format-units.ts";
import { formatLocalBeside, formatUtcCycle } from "@/lib/time.ts";
import { Timestamp } from "@/components/ui/timestamp.tsx";
import { formatForecastHour } from "../format-grid-labels.ts";

function RunFrames({ run }: { run: RunDto }) {
  return (
    <table className="w-full text-left text-sm">
      <thead className="text-xs text-muted">
        <tr>
          <th scope="col" className="px-3 py-1 font-medium">Hour</th>
          <th scope="col" className="px-3 py-1 font-medium">Valid</th>
          <th scope="col" className="px-3 py-1 font-medium">
            <span className="sr-only">Map</span>
          </th>
        </tr>
      </thead>
      <tbody>
        {run.frames.map((frame) => (
          <tr key={frame.id} className="border-t border-line/60">
            <td className="px-3 py-1 font-mono text-xs tabular-nums">{formatForecastHour(frame.forecastHour)}</td>
            <td className="px-3 py-1">
              <Timestamp value={frame.validTime} />
            </td>
            <td className="px-3 py-1 text-right">
              <Link
                to={gridFramePath(frame.id)}
                className="text-xs text-accent hover:underline"
                aria-label={`Open ${formatForecastHour(frame.forecastHour)} of the ${formatUtcCycle(run.runTime)} ${run.model} run on the map`}
              >
                Open map
              </Link>
            </td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}

/** Stored model runs, newest first, each with its frames in valid-time order. */
export function RunsList({ runs }: { runs: readonly RunDto[] }) {
  return (
    <div className="flex flex-col gap-3">
      {runs.map((run) => (
        <section key={run.id} aria-label={`${run.model} run ${formatUtcCycle(run.runTime)}`} className="rounded border border-line">
          <header className="flex flex-wrap items-baseline justify-between gap-2 border-b border-line bg-raised px-3 py-1.5">
            <h3 className="text-sm font-semibold">
              <span className="font-mono tabular-nums">{formatUtcCycle(run.runTime)}</span>
              <span className="font-normal text-muted"> · {formatLocalBeside(run.runTime)}</span>
              <span className="ml-2 font-normal">{run.model}</span>
            </h3>
            <span className="text-xs text-muted">{formatCount(run.frames.length, "frame")}</span>
          </header>
          <RunFrames run={run} />
        </section>
      ))}
    </div>
  );
}
