import { Link } from "react-router-dom";
import type { FrameSummaryDto } from "@shared/api/grids.ts";
import { formatUtcTime } from "@/lib/time.ts";
import { formatForecastHour } from "../../format-grid-labels.ts";

/** Neighbours of a frame among its run's frames, in valid-time order. */
export function neighbourFrames(frames: readonly FrameSummaryDto[], frameId: number): { previous: FrameSummaryDto | null; next: FrameSummaryDto | null; index: number } {
  const ordered = [...frames].sort((a, b) => a.validTime.localeCompare(b.validTime));
  const index = ordered.findIndex((frame) => frame.id === frameId);
  if (index < 0) return { previous: null, next: null, index };
  return { previous: ordered[index - 1] ?? null, next: ordered[index + 1] ?? null, index };
}

const STEP_CLASSES = "inline-flex h-7 items-center rounded border border-line bg-raised px-2.5 text-xs font-medium text-ink hover:border-muted";

/** Previous / next valid time of the same run, and every frame of the run as a direct link. */
export function FrameStepper({ frames, frameId, linkTo }: { frames: readonly FrameSummaryDto[]; frameId: number; linkTo: (frameId: number) => string }) {
  const ordered = [...frames].sort((a, b) => a.validTime.localeCompare(b.validTime));
  const { previous, next } = neighbourFrames(ordered, frameId);
  return (
    <nav aria-label="Valid times of this run" className="flex flex-wrap items-center gap-1.5">
      {previous ? (
        <Link to={linkTo(previous.id)} className={STEP_CLASSES} aria-keyshortcuts="[ ArrowLeft" title="Previous valid time ([ or ←)">
          ← Previous
        </Link>
      ) : (
        <span className={`${STEP_CLASSES} opacity-40`} aria-disabled="true">
          ← Previous
        </span>
      )}
      <ol className="flex flex-wrap gap-1">
        {ordered.map((frame) => {
          const current = frame.id === frameId;
          return (
            <li key={frame.id}>
              <Link
                to={linkTo(frame.id)}
                aria-current={current ? "page" : undefined}
                title={`Valid ${formatUtcTime(frame.validTime)}`}
                className={`inline-flex h-7 items-center rounded border px-1.5 font-mono text-xs tabular-nums ${
                  current ? "border-accent bg-accent/15 text-accent" : "border-line text-muted hover:border-muted hover:text-ink"
                }`}
              >
                {formatForecastHour(frame.forecastHour)}
              </Link>
            </li>
          );
        })}
      </ol>
      {next ? (
        <Link to={linkTo(next.id)} className={STEP_CLASSES} aria-keyshortcuts="] ArrowRight" title="Next valid time (] or →)">
          Next →
        </Link>
      ) : (
        <span className={`${STEP_CLASSES} opacity-40`} aria-disabled="true">
          Next →
        </span>
      )}
    </nav>
  );
}
