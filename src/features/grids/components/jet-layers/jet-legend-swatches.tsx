import type { CSSProperties, ReactNode } from "react";
import { MAP_GROUND } from "@/components/map/index.ts";
import { KEY_ARROW_PX } from "../../jet-layers/arrow-scale.ts";
import { QUADRANT_OPACITY } from "../../jet-layers/quadrant-legend.ts";
import { HATCH_SPACING_PX, JET_COLOURS } from "./jet-palette.ts";

/**
 * Small samples of what the jet layers draw, on the map's own dark ground so they look the same
 * as on the map in both themes.
 */
function Chip({ children, style, width = 16 }: { children?: ReactNode; style?: CSSProperties; width?: number }) {
  return (
    <span aria-hidden="true" className="inline-flex h-4 shrink-0 items-center justify-center rounded-sm border border-line" style={{ width, background: MAP_GROUND, ...style }}>
      {children}
    </span>
  );
}

/** The quadrant's tint as on the map, inside an outline in its full colour (as each quadrant is outlined on the map). */
export function QuadrantSwatch({ colour }: { colour: string }) {
  return (
    <Chip style={{ boxShadow: `inset 0 0 0 2px ${colour}` }}>
      <span className="h-full w-full" style={{ background: colour, opacity: QUADRANT_OPACITY }} />
    </Chip>
  );
}

export function FavouredSwatch() {
  // The map's hatching runs from lower left to upper right.
  return (
    <Chip
      style={{
        backgroundImage: `repeating-linear-gradient(135deg, rgba(255,255,255,0.6) 0 1.1px, transparent 1.1px ${HATCH_SPACING_PX / Math.SQRT2}px)`,
      }}
    />
  );
}

export function AmbiguousSwatch() {
  return <Chip style={{ backgroundImage: "radial-gradient(circle, rgba(255,255,255,0.85) 1.5px, transparent 1.8px)", backgroundSize: `${HATCH_SPACING_PX}px ${HATCH_SPACING_PX}px` }} />;
}

export function LineSwatch({ colour, width }: { colour: string; width: number }) {
  return (
    <Chip width={24}>
      <svg width="20" height="8" viewBox="0 0 20 8">
        <line x1="1" y1="4" x2="19" y2="4" stroke={colour} strokeWidth={width} strokeLinecap="round" />
      </svg>
    </Chip>
  );
}

export function CoreSwatch() {
  return (
    <Chip width={24}>
      <svg width="22" height="12" viewBox="0 0 22 12">
        <line x1="1" y1="6" x2="21" y2="6" stroke={JET_COLOURS.axis} strokeWidth="2.5" strokeLinecap="round" />
        <circle cx="11" cy="6" r="4.5" fill={JET_COLOURS.axis} stroke="#0a0e12" strokeWidth="1.5" />
      </svg>
    </Chip>
  );
}

/** The key arrow, exactly as long as an arrow of the key speed on the map. */
export function KeyArrow() {
  const length = KEY_ARROW_PX;
  return (
    <Chip width={length + 10}>
      <svg width={length + 6} height="10" viewBox={`0 0 ${length + 6} 10`}>
        <path
          d={`M3 5 H${length + 3} M${length - 1.5} 2.5 L${length + 3} 5 L${length - 1.5} 7.5`}
          fill="none"
          stroke={JET_COLOURS.arrow}
          strokeWidth="1.4"
          strokeLinecap="round"
          strokeLinejoin="round"
        />
      </svg>
    </Chip>
  );
}
