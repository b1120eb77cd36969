import type { ProfileLevel } from "../chart/profile-interpolation.ts";
import { windBarbGlyph, thinBySpacing, type WindBarbStyle, DEFAULT_BARB_STYLE } from "../chart/wind-barb.ts";
import { SKEW_T_FRAME, SKEW_T_GEOMETRY } from "../chart/skew-t-layout.ts";

/** Barbs closer than this (px) are skipped so dense model columns stay legible. */
const MIN_BARB_GAP = 20;

/** Wind barbs in knots beside the skew-T, one per level with a wind, thinned where levels crowd. */
export function WindBarbColumn({ levels, x, color, side }: { levels: readonly ProfileLevel[]; x: number; color: string; side: 1 | -1 }) {
  const windy = levels.filter((l) => l.u !== null && l.v !== null && l.pressure >= SKEW_T_FRAME.topPressure);
  const ys = windy.map((l) => SKEW_T_GEOMETRY.yOfPressure(l.pressure));
  const style: WindBarbStyle = { ...DEFAULT_BARB_STYLE, side };
  return (
    <g aria-hidden="true" stroke={color} fill={color} strokeWidth={1.3} strokeLinecap="round">
      <line x1={x} x2={x} y1={SKEW_T_FRAME.top} y2={SKEW_T_FRAME.top + SKEW_T_FRAME.height} strokeOpacity={0.25} strokeWidth={1} />
      {thinBySpacing(ys, MIN_BARB_GAP).map((index) => {
        const level = windy[index];
        const glyph = windBarbGlyph(level.u!, level.v!, style);
        const y = ys[index];
        return (
          <g key={level.pressure} transform={`translate(${x} ${y.toFixed(1)})`}>
            {glyph.calm ? (
              <circle r={3} fill="none" />
            ) : (
              <>
                <line x1={glyph.staff[0]} y1={glyph.staff[1]} x2={glyph.staff[2]} y2={glyph.staff[3]} />
                {glyph.feathers.map((f, i) => (
                  <line key={i} x1={f[0]} y1={f[1]} x2={f[2]} y2={f[3]} />
                ))}
                {glyph.pennants.map((points, i) => (
                  <polygon key={`p${i}`} points={points.map((pt) => pt.join(",")).join(" ")} strokeWidth={0.8} />
                ))}
                <circle r={1.6} stroke="none" />
              </>
            )}
          </g>
        );
      })}
    </g>
  );
}
