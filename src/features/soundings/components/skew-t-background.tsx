import { memo } from "react";
import { ICE_POINT } from "@shared/meteo/constants.ts";
import type { ChartPalette } from "../chart/chart-palette.ts";
import { pathThrough } from "../chart/skew-t-geometry.ts";
import { ISOBARS, ISOTHERMS, SKEW_T_FRAME, SKEW_T_GEOMETRY, isothermEnds, skewTBackground } from "../chart/skew-t-layout.ts";

const g = SKEW_T_GEOMETRY;
const { left, top, width, height } = SKEW_T_FRAME;
const bottom = top + height;
const right = left + width;

/** x where an isotherm crosses a horizontal line y, for placing its label. */
function isothermXAt(temperature: number, y: number): number {
  return g.xOf(temperature, g.pressureOfY(y));
}

/**
 * The still part of the diagram: isobars, isotherms, dry adiabats, pseudo-adiabats and mixing-ratio lines,
 * clipped to the plot, with pressure and temperature labels. It depends only on the layout and the theme.
 */
export const SkewTBackground = memo(function SkewTBackground({ palette, clipId }: { palette: ChartPalette; clipId: string }) {
  const lines = skewTBackground();
  return (
    <g aria-hidden="true">
      <g clipPath={`url(#${clipId})`} fill="none">
        {lines.dry.map((line) => (
          <path key={`d${line.value}`} d={pathThrough(g, line.points)} stroke={palette.dryAdiabat} strokeWidth={0.8} />
        ))}
        {lines.moist.map((line) => (
          <path key={`m${line.value}`} d={pathThrough(g, line.points)} stroke={palette.moistAdiabat} strokeWidth={0.8} strokeDasharray="5 3" />
        ))}
        {lines.mixing.map((line) => (
          <path key={`w${line.value}`} d={pathThrough(g, line.points)} stroke={palette.mixingRatio} strokeWidth={0.8} strokeDasharray="1.5 3" />
        ))}
        {ISOTHERMS.map((t) => (
          <path
            key={`t${t}`}
            d={pathThrough(g, isothermEnds(t))}
            stroke={Math.round(t - ICE_POINT) === 0 ? palette.gridStrong : palette.grid}
            strokeWidth={Math.round(t - ICE_POINT) === 0 ? 1.4 : 1}
          />
        ))}
        {ISOBARS.map((p) => (
          <line key={`p${p}`} x1={left} x2={right} y1={g.yOfPressure(p)} y2={g.yOfPressure(p)} stroke={palette.grid} strokeWidth={1} />
        ))}
      </g>
      <g fontSize={11} fill={palette.label} className="font-mono">
        {ISOBARS.map((p) => (
          <text key={`pl${p}`} x={left - 6} y={g.yOfPressure(p) + 4} textAnchor="end">
            {p / 100}
          </text>
        ))}
        <text x={left - 6} y={bottom + 30} textAnchor="end" fontSize={10}>
          hPa
        </text>
        {ISOTHERMS.map((t) => {
          const xBottom = g.xOf(t, SKEW_T_FRAME.bottomPressure);
          if (xBottom >= left - 0.5 && xBottom <= right + 0.5) {
            return (
              <text key={`tl${t}`} x={xBottom} y={bottom + 15} textAnchor="middle">
                {Math.round(t - ICE_POINT)}
              </text>
            );
          }
          // Colder isotherms enter through the left edge: label them just inside it.
          const y = bottom - (left - xBottom) / SKEW_T_FRAME.skew;
          if (y < top + 20 || isothermXAt(t, y) > right) return null;
          return (
            <text key={`tl${t}`} x={left + 4} y={y - 4} fontSize={10}>
              {Math.round(t - ICE_POINT)}
            </text>
          );
        })}
        <text x={right} y={bottom + 30} textAnchor="end" fontSize={10}>
          °C
        </text>
        {lines.mixing.map((line) => {
          const end = line.points[line.points.length - 1];
          const x = g.xOf(end.temperature, end.pressure);
          if (x < left || x > right) return null;
          return (
            <text key={`wl${line.value}`} x={x} y={g.yOfPressure(end.pressure) - 3} textAnchor="middle" fontSize={9} fill={palette.label}>
              {Math.round(line.value * 1000)}
            </text>
          );
        })}
      </g>
    </g>
  );
});
