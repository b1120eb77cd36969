import { useId, useMemo, useState, type PointerEvent } from "react";
import type { SoundingReportDto } from "@shared/api/soundings.ts";
import { useTheme } from "@/lib/theme.tsx";
import { chartPalette, PARCEL_DASHES } from "../chart/chart-palette.ts";
import { pressureAtHeight } from "../chart/profile-interpolation.ts";
import { levelMarkers, shadedAreas, skewTData } from "../chart/skew-t-data.ts";
import { spreadUpward } from "../chart/label-spread.ts";
import { pathThrough } from "../chart/skew-t-geometry.ts";
import { BARB_COLUMN_X, HEIGHT_MARKS, SKEW_T_FRAME, SKEW_T_GEOMETRY, SKEW_T_VIEW } from "../chart/skew-t-layout.ts";
import { PARCEL_TAGS, type ParcelId } from "../parcels.ts";
import { skewTSummary } from "../sounding-summary.ts";
import { SkewTBackground } from "./skew-t-background.tsx";
import { SkewTReadout } from "./skew-t-readout.tsx";
import { WindBarbColumn } from "./wind-barb-column.tsx";

const g = SKEW_T_GEOMETRY;
const { left, top, width, height } = SKEW_T_FRAME;
const right = left + width;
const bottom = top + height;

/** SVG user-space y of a pointer event (the figure is scaled to fit its box). */
function svgY(event: PointerEvent<SVGElement>): number | null {
  const svg = event.currentTarget.ownerSVGElement ?? (event.currentTarget as unknown as SVGSVGElement);
  const matrix = svg.getScreenCTM();
  if (!matrix) return null;
  return new DOMPoint(event.clientX, event.clientY).matrixTransform(matrix.inverse()).y;
}

/**
 * The skew-T log-p diagram: environment temperature and dewpoint, the three parcel paths, the shaded CAPE and
 * CIN of the chosen parcel with its LCL/LFC/EL, height marks, wind barbs, and a readout that follows the pointer.
 */
export function SkewTDiagram({ report, shaded }: { report: SoundingReportDto; shaded: ParcelId }) {
  const { theme } = useTheme();
  const palette = chartPalette(theme);
  const clipId = `skewt-clip-${useId().replace(/[^a-zA-Z0-9_-]/g, "")}`;
  const data = useMemo(() => skewTData(report), [report]);
  const areas = useMemo(() => shadedAreas(data, shaded), [data, shaded]);
  const markers = useMemo(() => levelMarkers(data, shaded), [data, shaded]);
  // An LFC just above the LCL would print its label over the LCL's.
  const markerLabelYs = spreadUpward(markers.map((m) => g.yOfPressure(m.pressure)), 12);
  const [cursorY, setCursorY] = useState<number | null>(null);
  const side = report.meta.options.hemisphere === "south" ? -1 : 1;
  // Draw the shaded parcel last so it sits on top of the other two.
  const parcels = [...data.parcels].sort((a, b) => Number(a.id === shaded) - Number(b.id === shaded));

  return (
    <svg
      viewBox={`0 0 ${SKEW_T_VIEW.width} ${SKEW_T_VIEW.height}`}
      role="img"
      aria-label={skewTSummary(report, shaded)}
      data-testid="skew-t"
      className="h-auto w-full touch-none select-none"
    >
      <defs>
        <clipPath id={clipId}>
          <rect x={left} y={top} width={width} height={height} />
        </clipPath>
      </defs>
      <SkewTBackground palette={palette} clipId={clipId} />

      <g clipPath={`url(#${clipId})`}>
        {areas.map((area, i) => (
          <path
            key={`${area.kind}${i}`}
            data-area={area.kind}
            d={`${pathThrough(g, area.parcel)}L${pathThrough(g, [...area.environment].reverse()).slice(1)}Z`}
            fill={area.kind === "positive" ? palette.positiveArea : palette.negativeArea}
            fillOpacity={0.3}
            stroke="none"
          />
        ))}
        <path d={pathThrough(g, data.compared)} fill="none" stroke={palette.temperature} strokeWidth={1} strokeDasharray="3 3" strokeOpacity={0.7} />
        {parcels.map((parcel) => (
          <path
            key={parcel.id}
            data-parcel={parcel.id}
            d={pathThrough(g, parcel.points)}
            fill="none"
            stroke={palette.parcels[parcel.id]}
            strokeWidth={parcel.id === shaded ? 2.2 : 1.4}
            strokeOpacity={parcel.id === shaded ? 1 : 0.75}
            strokeDasharray={PARCEL_DASHES[parcel.id] || undefined}
          />
        ))}
        <path data-line="dewpoint" d={pathThrough(g, data.dewpoint)} fill="none" stroke={palette.dewpoint} strokeWidth={2.6} strokeLinejoin="round" />
        <path data-line="temperature" d={pathThrough(g, data.temperature)} fill="none" stroke={palette.temperature} strokeWidth={2.6} strokeLinejoin="round" />
      </g>

      <g fontSize={10} className="font-mono" fill={palette.label}>
        {HEIGHT_MARKS.map((z) => {
          const p = pressureAtHeight(data.levels, z);
          if (p === null) return null;
          const y = g.yOfPressure(p);
          return (
            <g key={z}>
              <line x1={right - 8} x2={right} y1={y} y2={y} stroke={palette.label} />
              <text x={right - 11} y={y + 3.5} textAnchor="end">
                {z / 1000} km
              </text>
            </g>
          );
        })}
      </g>

      <g fontSize={10} className="font-mono" fill={palette.parcels[shaded]}>
        {markers.map((m, i) => {
          const x = g.xOf(m.temperature, m.pressure);
          const y = g.yOfPressure(m.pressure);
          return (
            <g key={m.kind} data-marker={m.kind}>
              <line x1={x - 9} x2={x + 9} y1={y} y2={y} stroke={palette.parcels[shaded]} strokeWidth={2} />
              <text x={x + 13} y={markerLabelYs[i] + 3.5}>
                {PARCEL_TAGS[shaded]} {m.kind}
              </text>
            </g>
          );
        })}
      </g>

      <rect x={left} y={top} width={width} height={height} fill="none" stroke={palette.gridStrong} />
      <WindBarbColumn levels={data.levels} x={BARB_COLUMN_X} color={palette.barb} side={side} />
      <text x={BARB_COLUMN_X} y={bottom + 30} textAnchor="middle" fontSize={10} fill={palette.label} className="font-mono">
        kt
      </text>

      <SkewTReadout cursorY={cursorY} levels={data.levels} palette={palette} />
      <rect
        x={left}
        y={top}
        width={width}
        height={height}
        fill="transparent"
        onPointerMove={(event) => setCursorY(svgY(event))}
        onPointerLeave={() => setCursorY(null)}
      />
    </svg>
  );
}
