import { binLeadTimes } from "@shared/verification/lead-time-bins.ts";
import { formatMinutes } from "../format-verification.ts";

const WIDTH = 420;
const HEIGHT = 200;
const MARGIN = { top: 14, right: 12, bottom: 40, left: 36 };

const hours = (minutes: number) => (minutes % 60 === 0 ? `${minutes / 60} h` : `${(minutes / 60).toFixed(1)} h`);

/** How long before each detected report its trigger opened: equal-width bars, with the median and 90th percentile marked. */
export function LeadTimeHistogram({ minutes, median, p90, title }: { minutes: readonly number[]; median: number | null; p90: number | null; title: string }) {
  const bins = binLeadTimes(minutes);
  if (bins.length === 0) return <p className="text-muted">No detected report, so no lead time to show.</p>;
  const span = bins[bins.length - 1]!.toMinutes;
  const top = Math.max(...bins.map((b) => b.count));
  const plotW = WIDTH - MARGIN.left - MARGIN.right;
  const plotH = HEIGHT - MARGIN.top - MARGIN.bottom;
  const x = (m: number) => MARGIN.left + (m / span) * plotW;
  const y = (count: number) => MARGIN.top + plotH - (count / top) * plotH;
  const yTicks = top <= 5 ? Array.from({ length: top + 1 }, (_, k) => k) : [0, Math.round(top / 2), top];
  const labelEvery = Math.ceil(bins.length / 8);
  const summary = bins.map((b) => `${formatMinutes(b.fromMinutes)} to ${formatMinutes(b.toMinutes)}: ${b.count}`).join("; ");
  return (
    <figure className="flex flex-col gap-2">
      <svg role="img" aria-label={`${title}. ${summary}. Median ${formatMinutes(median)}, 90th percentile ${formatMinutes(p90)}.`} viewBox={`0 0 ${WIDTH} ${HEIGHT}`} className="w-full max-w-[520px] text-muted">
        {yTicks.map((t) => (
          <g key={`y-${t}`}>
            <line x1={MARGIN.left} x2={WIDTH - MARGIN.right} y1={y(t)} y2={y(t)} stroke="var(--bw-line)" />
            <text x={MARGIN.left - 5} y={y(t) + 3} textAnchor="end" fontSize={10} fill="currentColor">
              {t}
            </text>
          </g>
        ))}
        {bins.map((b, k) => (
          <g key={b.fromMinutes}>
            <rect x={x(b.fromMinutes) + 1} y={y(b.count)} width={Math.max(1, x(b.toMinutes) - x(b.fromMinutes) - 2)} height={MARGIN.top + plotH - y(b.count)} fill="var(--bw-accent)" data-count={b.count}>
              <title>{`${formatMinutes(b.fromMinutes)} – ${formatMinutes(b.toMinutes)}: ${b.count}`}</title>
            </rect>
            {k % labelEvery === 0 && (
              <text x={x(b.fromMinutes)} y={MARGIN.top + plotH + 13} textAnchor="middle" fontSize={10} fill="currentColor">
                {hours(b.fromMinutes)}
              </text>
            )}
          </g>
        ))}
        {[
          { value: median, label: "median", dash: "none" },
          { value: p90, label: "90th pct", dash: "4 3" },
        ].map((mark) =>
          mark.value === null ? null : (
            <g key={mark.label}>
              <line x1={x(mark.value)} x2={x(mark.value)} y1={MARGIN.top} y2={MARGIN.top + plotH} stroke="var(--bw-focus)" strokeWidth={1.5} strokeDasharray={mark.dash} />
              <text x={x(mark.value) + 3} y={MARGIN.top + 9} fontSize={9} fill="var(--bw-focus)">
                {mark.label}
              </text>
            </g>
          ),
        )}
        <text x={MARGIN.left + plotW / 2} y={HEIGHT - 6} textAnchor="middle" fontSize={11} fill="var(--bw-ink)">
          Lead time (report time − trigger opened)
        </text>
      </svg>
      <figcaption className="text-xs text-muted">
        {title}: {minutes.length} detected {minutes.length === 1 ? "report" : "reports"}, median {formatMinutes(median)}, 90th percentile {formatMinutes(p90)}.
      </figcaption>
    </figure>
  );
}
