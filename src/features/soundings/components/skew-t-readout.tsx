import { formatCelsius, formatHectopascals, formatNumber } from "@/lib/format-units.ts";
import type { ChartPalette } from "../chart/chart-palette.ts";
import { environmentAt, type ProfileLevel } from "../chart/profile-interpolation.ts";
import { SKEW_T_FRAME, SKEW_T_GEOMETRY } from "../chart/skew-t-layout.ts";

const g = SKEW_T_GEOMETRY;
const { left, top, width, height } = SKEW_T_FRAME;

/** The lines of the pointer readout at a pressure: pressure and height, then T and Td of the environment. */
export function readoutLines(levels: readonly ProfileLevel[], pressure: number): string[] {
  const env = environmentAt(levels, pressure);
  if (!env) return [`${formatHectopascals(pressure)} hPa`, "outside the sounding"];
  return [
    `${formatHectopascals(pressure)} hPa · ${formatNumber(env.height)} m AGL`,
    `T ${formatCelsius(env.temperature)} °C · Td ${formatCelsius(env.dewpoint)} °C`,
  ];
}

/** A guide line at the pointer's pressure with the environment's values there, boxed in the plot's top-left corner. */
export function SkewTReadout({ cursorY, levels, palette }: { cursorY: number | null; levels: readonly ProfileLevel[]; palette: ChartPalette }) {
  if (cursorY === null || cursorY < top || cursorY > top + height) return null;
  const pressure = g.pressureOfY(cursorY);
  const env = environmentAt(levels, pressure);
  const lines = readoutLines(levels, pressure);
  return (
    <g pointerEvents="none" data-testid="skew-t-readout">
      <line x1={left} x2={left + width} y1={cursorY} y2={cursorY} stroke={palette.cursor} strokeWidth={1} strokeDasharray="4 3" />
      {env && (
        <>
          <circle cx={g.xOf(env.temperature, pressure)} cy={cursorY} r={3.5} fill={palette.temperature} />
          <circle cx={g.xOf(env.dewpoint, pressure)} cy={cursorY} r={3.5} fill={palette.dewpoint} />
        </>
      )}
      <rect x={left + 8} y={top + 8} width={232} height={42} rx={4} fill="var(--bw-surface)" fillOpacity={0.92} stroke={palette.gridStrong} />
      {lines.map((line, i) => (
        <text key={i} x={left + 16} y={top + 25 + i * 16} fontSize={11.5} fill="var(--bw-ink)" className="font-mono">
          {line}
        </text>
      ))}
    </g>
  );
}
