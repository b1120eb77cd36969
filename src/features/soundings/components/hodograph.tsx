import { useId, useMemo } from "react";
import type { SoundingReportDto } from "@shared/api/soundings.ts";
import { knotsFromMetersPerSecond } from "@/lib/format-units.ts";
import { useTheme } from "@/lib/theme.tsx";
import { bandColor, chartPalette } from "../chart/chart-palette.ts";
import {
  HEIGHT_BANDS,
  HODOGRAPH_TOP,
  hodographBetween,
  hodographPoints,
  hodographWindow,
  ringLabelSpot,
  ringSpacing,
  windAtHeight,
  type HodographPoint,
} from "../chart/hodograph-geometry.ts";
import { hodographSummary } from "../sounding-summary.ts";

const SIZE = 420;
const PAD = 14;
const HALF = (SIZE - 2 * PAD) / 2;
const HEIGHT_LABELS = [1000, 3000, 6000, 9000];

type Kt = { u: number; v: number };

/**
 * The hodograph in knots: the wind profile coloured by height band, labelled rings, height marks, the Bunkers
 * right- and left-mover motions, the 0–6 km mean wind, and the effective inflow layer's storm-relative sweep.
 */
export function Hodograph({ report }: { report: SoundingReportDto }) {
  const { theme } = useTheme();
  const palette = chartPalette(theme);
  const clipId = `hodo-clip-${useId().replace(/[^a-zA-Z0-9_-]/g, "")}`;
  const points = useMemo(() => hodographPoints(report.levels).filter((p) => p.height <= HODOGRAPH_TOP + 1500), [report.levels]);
  const drawn = useMemo(() => hodographBetween(points, 0, HODOGRAPH_TOP), [points]);

  const toKt = (pair: readonly [number, number]): Kt => ({ u: knotsFromMetersPerSecond(pair[0]), v: knotsFromMetersPerSecond(pair[1]) });
  const rm = report.stormMotion ? toKt(report.stormMotion.rm) : null;
  const lm = report.stormMotion ? toKt(report.stormMotion.lm) : null;
  const mu = report.fields.meanwind_0_6km_u;
  const mv = report.fields.meanwind_0_6km_v;
  const mean = mu !== null && mv !== null ? toKt([mu, mv]) : null;

  const view = hodographWindow([...drawn, ...[rm, lm].filter((p): p is Kt => p !== null)]);
  const scale = HALF / view.halfSpan;
  const x = (u: number) => SIZE / 2 + (u - view.centerU) * scale;
  const y = (v: number) => SIZE / 2 - (v - view.centerV) * scale;
  const line = (pts: readonly Kt[]) => pts.map((p, i) => `${i ? "L" : "M"}${x(p.u).toFixed(1)} ${y(p.v).toFixed(1)}`).join("");

  const maxSpeed = Math.max(...drawn.map((p) => Math.hypot(p.u, p.v)), 20);
  const ring = ringSpacing(maxSpeed);
  const reach = Math.hypot(Math.abs(view.centerU) + view.halfSpan, Math.abs(view.centerV) + view.halfSpan);
  const rings = Array.from({ length: Math.floor(reach / ring) }, (_, i) => (i + 1) * ring);
  const obstacles = [...drawn, ...[rm, lm, mean].filter((p): p is Kt => p !== null)];
  const inside = (px: number, py: number) => px > PAD + 8 && px < SIZE - PAD - 8 && py > PAD + 8 && py < SIZE - PAD - 8;

  const eff = report.effectiveLayer;
  const inflow = eff && rm && eff.topHeight > eff.baseHeight ? hodographBetween(points, eff.baseHeight, eff.topHeight) : [];

  return (
    <svg viewBox={`0 0 ${SIZE} ${SIZE}`} role="img" aria-label={hodographSummary(report)} data-testid="hodograph" className="h-auto w-full">
      <defs>
        <clipPath id={clipId}>
          <rect x={PAD} y={PAD} width={SIZE - 2 * PAD} height={SIZE - 2 * PAD} />
        </clipPath>
      </defs>
      <g clipPath={`url(#${clipId})`}>
        <g fill="none" stroke={palette.grid} aria-hidden="true">
          {rings.map((r) => (
            <circle key={r} cx={x(0)} cy={y(0)} r={r * scale} />
          ))}
          <line x1={x(0)} x2={x(0)} y1={0} y2={SIZE} stroke={palette.gridStrong} />
          <line y1={y(0)} y2={y(0)} x1={0} x2={SIZE} stroke={palette.gridStrong} />
        </g>
        {inflow.length > 1 && rm && (
          <g data-testid="effective-inflow">
            <path d={`${line([rm, ...inflow])}Z`} fill={palette.inflow} fillOpacity={0.16} stroke="none" />
            <path d={line([inflow[0], rm, inflow[inflow.length - 1]])} fill="none" stroke={palette.inflow} strokeDasharray="4 3" strokeWidth={1.2} />
          </g>
        )}
        {HEIGHT_BANDS.map((band, i) => {
          const part = hodographBetween(points, band.from, band.to);
          return part.length > 1 ? (
            <path key={band.id} data-band={band.id} d={line(part)} fill="none" stroke={bandColor(palette, i)} strokeWidth={3.2} strokeLinecap="round" strokeLinejoin="round" />
          ) : null;
        })}
      </g>
      <g fontSize={10} className="font-mono" fill={palette.label} aria-hidden="true">
        {rings.map((r) => {
          const spot = ringLabelSpot(r, (u, v) => inside(x(u), y(v)), obstacles);
          return spot ? (
            <text key={r} x={x(spot.u) + 3} y={y(spot.v) + 11}>
              {r}
            </text>
          ) : null;
        })}
        <text x={SIZE - PAD - 4} y={SIZE - PAD - 4} textAnchor="end">
          kt
        </text>
      </g>
      <HeightMarks points={points} x={x} y={y} color={palette.label} />
      {mean && (
        <g data-testid="mean-wind" stroke={palette.stormMotion} strokeWidth={1.5}>
          <line x1={x(mean.u) - 5} x2={x(mean.u) + 5} y1={y(mean.v)} y2={y(mean.v)} />
          <line x1={x(mean.u)} x2={x(mean.u)} y1={y(mean.v) - 5} y2={y(mean.v) + 5} />
        </g>
      )}
      {rm && <MotionMark at={rm} label="RM" filled x={x} y={y} color={palette.stormMotion} />}
      {lm && <MotionMark at={lm} label="LM" filled={false} x={x} y={y} color={palette.stormMotion} />}
    </svg>
  );
}

function HeightMarks({ points, x, y, color }: { points: readonly HodographPoint[]; x: (u: number) => number; y: (v: number) => number; color: string }) {
  return (
    <g fontSize={10} className="font-mono" fill={color} aria-hidden="true">
      {HEIGHT_LABELS.map((z) => {
        const at = windAtHeight(points, z);
        if (!at) return null;
        return (
          <g key={z}>
            <circle cx={x(at.u)} cy={y(at.v)} r={2.6} fill="var(--bw-surface)" stroke={color} />
            <text x={x(at.u) + 5} y={y(at.v) - 5}>
              {z / 1000}
            </text>
          </g>
        );
      })}
    </g>
  );
}

function MotionMark({ at, label, filled, x, y, color }: { at: Kt; label: string; filled: boolean; x: (u: number) => number; y: (v: number) => number; color: string }) {
  return (
    <g data-testid={`storm-${label.toLowerCase()}`}>
      <circle cx={x(at.u)} cy={y(at.v)} r={4.5} fill={filled ? color : "var(--bw-surface)"} stroke={color} strokeWidth={1.5} />
      <text x={x(at.u) + 7} y={y(at.v) + 4} fontSize={11} fontWeight={600} fill={color} className="font-mono">
        {label}
      </text>
    </g>
  );
}
