import { useMemo } from "react";
import type { TriggerFrameDto } from "@shared/api/triggers.ts";
import { formatUtcTime } from "@/lib/time.ts";
import { coverageSeries, validTimeExtent } from "../detail/coverage-series.ts";
import { formatRunLabel } from "../timeline/trigger-labels.ts";

const WIDTH = 560;
const HEIGHT = 150;
const PAD = { left: 36, right: 12, top: 10, bottom: 22 };

/**
 * Coverage of the zone per valid time, one line per model run: the newest run bright, older runs
 * fainter, so a signal that holds (or grows) from run to run is seen at a glance. Filled dots
 * are frames where the rule was met.
 */
export function CoverageChart({ frames }: { frames: readonly TriggerFrameDto[] }) {
  const series = useMemo(() => coverageSeries(frames), [frames]);
  const extent = validTimeExtent(series);
  if (!extent) return null;
  const top = Math.max(10, Math.ceil(Math.max(...series.flatMap((s) => s.points.map((p) => p.coverage))) / 10) * 10);
  const span = extent[1] - extent[0] || 3_600_000;
  const x = (time: string) => PAD.left + ((Date.parse(time) - extent[0]) / span) * (WIDTH - PAD.left - PAD.right) + (extent[1] === extent[0] ? (WIDTH - PAD.left - PAD.right) / 2 : 0);
  const y = (coverage: number) => PAD.top + (1 - coverage / top) * (HEIGHT - PAD.top - PAD.bottom);
  const times = [...new Set(series.flatMap((s) => s.points.map((p) => p.validTime)))].sort();
  const step = Math.max(1, Math.ceil(times.length / 8));
  const newest = series.length - 1;

  return (
    <figure className="flex flex-col gap-1">
      <svg viewBox={`0 0 ${WIDTH} ${HEIGHT}`} className="w-full max-w-2xl" role="img" aria-label={`Coverage of the zone per valid time for ${series.length} model run${series.length === 1 ? "" : "s"}`}>
        {[0, top / 2, top].map((tick) => (
          <g key={tick}>
            <line x1={PAD.left} x2={WIDTH - PAD.right} y1={y(tick)} y2={y(tick)} stroke="var(--bw-line)" strokeWidth={1} />
            <text x={PAD.left - 6} y={y(tick)} textAnchor="end" dominantBaseline="middle" fontSize={10} fill="var(--bw-muted)">
              {tick} %
            </text>
          </g>
        ))}
        {times.map((time, index) =>
          index % step === 0 ? (
            <text key={time} x={x(time)} y={HEIGHT - 6} textAnchor="middle" fontSize={10} fill="var(--bw-muted)">
              {formatUtcTime(time).replace(":00Z", "Z")}
            </text>
          ) : null,
        )}
        {series.map((s, index) => {
          const colour = index === newest ? "var(--bw-accent)" : "var(--bw-muted)";
          const opacity = index === newest ? 1 : 0.35 + (0.4 * index) / Math.max(1, newest);
          return (
            <g key={s.runTime} opacity={opacity}>
              <polyline fill="none" stroke={colour} strokeWidth={index === newest ? 2 : 1.3} points={s.points.map((p) => `${x(p.validTime)},${y(p.coverage)}`).join(" ")} />
              {s.points.map((p) => (
                <circle key={p.frameId} cx={x(p.validTime)} cy={y(p.coverage)} r={3} fill={p.met ? colour : "var(--bw-surface)"} stroke={colour} strokeWidth={1.3} />
              ))}
            </g>
          );
        })}
      </svg>
      <figcaption className="flex flex-wrap gap-x-4 text-xs text-muted">
        {series.map((s, index) => (
          <span key={s.runTime} className="flex items-center gap-1.5">
            <span aria-hidden="true" className={`inline-block h-0.5 w-4 ${index === newest ? "bg-accent" : "bg-muted/60"}`} />
            {formatRunLabel(s.runTime)}
            {index === newest && " (newest)"}
          </span>
        ))}
        <span>· filled dots: rule met</span>
      </figcaption>
    </figure>
  );
}
