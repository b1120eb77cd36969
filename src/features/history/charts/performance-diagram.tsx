import { BIAS_LINES, CSI_CONTOURS, biasLine, csiContour, type UnitPoint } from "./performance-geometry.ts";
import { formatScore } from "../format-verification.ts";

export interface DiagramPoint {
  id: string;
  label: string;
  successRatio: number | null;
  pod: number | null;
  /** Marker shape, so series differ without relying on colour alone. */
  shape: "circle" | "square" | "diamond" | "triangle";
  colour: string;
}

const SIZE = 320;
const MARGIN = { top: 16, right: 40, bottom: 44, left: 48 };
const x = (sr: number) => MARGIN.left + sr * SIZE;
const y = (pod: number) => MARGIN.top + (1 - pod) * SIZE;
const path = (points: readonly UnitPoint[]) => points.map(([sr, pod], k) => `${k === 0 ? "M" : "L"}${x(sr).toFixed(1)},${y(pod).toFixed(1)}`).join("");
const TICKS = [0, 0.2, 0.4, 0.6, 0.8, 1];

function Marker({ point }: { point: DiagramPoint & { successRatio: number; pod: number } }) {
  const cx = x(point.successRatio);
  const cy = y(point.pod);
  const common = { fill: point.colour, stroke: "var(--bw-canvas)", strokeWidth: 1.5 };
  switch (point.shape) {
    case "square":
      return <rect x={cx - 5.5} y={cy - 5.5} width={11} height={11} {...common} />;
    case "diamond":
      return <path d={`M${cx},${cy - 7}L${cx + 7},${cy}L${cx},${cy + 7}L${cx - 7},${cy}Z`} {...common} />;
    case "triangle":
      return <path d={`M${cx},${cy - 7}L${cx + 7},${cy + 6}L${cx - 7},${cy + 6}Z`} {...common} />;
    default:
      return <circle cx={cx} cy={cy} r={6} {...common} />;
  }
}

/**
 * A performance diagram after Roebber (2009): probability of detection against success ratio, with
 * dashed frequency-bias rays and solid CSI curves, so POD, FAR, bias and CSI read off one point.
 * Perfect forecasts sit at the top right.
 */
export function PerformanceDiagram({ points, title }: { points: readonly DiagramPoint[]; title: string }) {
  const plotted = points.filter((p): p is DiagramPoint & { successRatio: number; pod: number } => p.successRatio !== null && p.pod !== null);
  const missing = points.filter((p) => p.successRatio === null || p.pod === null);
  const description = plotted.map((p) => `${p.label}: success ratio ${formatScore(p.successRatio)}, POD ${formatScore(p.pod)}`).join("; ");
  return (
    <figure className="flex flex-col gap-2">
      <svg
        role="img"
        aria-label={`${title}. ${description || "No point to plot."}`}
        viewBox={`0 0 ${SIZE + MARGIN.left + MARGIN.right} ${SIZE + MARGIN.top + MARGIN.bottom}`}
        className="w-full max-w-[420px] text-muted"
      >
        <rect x={x(0)} y={y(1)} width={SIZE} height={SIZE} fill="var(--bw-canvas)" stroke="var(--bw-line)" />
        {CSI_CONTOURS.map((c) => {
          const line = csiContour(c);
          const end = line[line.length - 1]!;
          return (
            <g key={`csi-${c}`}>
              <path d={path(line)} fill="none" stroke="currentColor" strokeOpacity={0.55} strokeWidth={0.8} />
              <text x={x(end[0]) + 3} y={y(end[1]) + 3} fontSize={9} fill="currentColor">
                {c.toFixed(1)}
              </text>
            </g>
          );
        })}
        {BIAS_LINES.map((b) => {
          const [, end] = biasLine(b);
          return (
            <g key={`bias-${b}`}>
              <path d={path([[0, 0], end])} fill="none" stroke="currentColor" strokeOpacity={0.45} strokeDasharray="4 3" strokeWidth={0.8} />
              <text x={x(end[0]) + (b >= 1 ? -2 : 3)} y={y(end[1]) + (b >= 1 ? -3 : 3)} fontSize={9} fill="currentColor" textAnchor={b >= 1 ? "middle" : "start"}>
                {b}
              </text>
            </g>
          );
        })}
        {TICKS.map((t) => (
          <g key={`tick-${t}`} fontSize={10} fill="currentColor">
            <text x={x(t)} y={y(0) + 14} textAnchor="middle">
              {t.toFixed(1)}
            </text>
            <text x={x(0) - 6} y={y(t) + 3} textAnchor="end">
              {t.toFixed(1)}
            </text>
          </g>
        ))}
        <text x={x(0.5)} y={y(0) + 32} textAnchor="middle" fontSize={11} fill="var(--bw-ink)">
          Success ratio (1 − FAR)
        </text>
        <text transform={`translate(${x(0) - 36},${y(0.5)}) rotate(-90)`} textAnchor="middle" fontSize={11} fill="var(--bw-ink)">
          Probability of detection
        </text>
        {plotted.map((p) => (
          <g key={p.id} data-point={p.id}>
            <title>{`${p.label}: SR ${formatScore(p.successRatio)}, POD ${formatScore(p.pod)}`}</title>
            <Marker point={p} />
          </g>
        ))}
      </svg>
      <figcaption className="flex flex-col gap-1 text-xs text-muted">
        <span>{title}. Solid curves: critical success index; dashed rays: frequency bias (Roebber 2009).</span>
        <ul className="flex flex-wrap gap-x-4 gap-y-1">
          {points.map((p) => (
            <li key={p.id} className="flex items-center gap-1.5 text-ink">
              <svg width="14" height="14" viewBox={`${x(0) - 7} ${y(1) - 7} 14 14`} aria-hidden="true">
                <Marker point={{ ...p, successRatio: 0, pod: 1 }} />
              </svg>
              {p.label}
              {missing.includes(p) && <span className="text-muted">(not plotted: nothing to score)</span>}
            </li>
          ))}
        </ul>
      </figcaption>
    </figure>
  );
}
