/**
 * The objects of the jet-streak labelling: cores, traced axes and the streak summary stored per frame.
 */

/** A local speed maximum that qualifies as a streak core. */
export interface JetCore {
  /** Grid point of the maximum (index = j·nx + i). */
  readonly index: number;
  /** Core position in fractional grid indices, refined by a parabola through the neighbours. */
  readonly i: number;
  readonly j: number;
  /** Smoothed speed at the maximum grid point (m s⁻¹). */
  readonly speed: number;
}

/** Why an axis stopped growing in one direction. */
export type AxisStop = "slow" | "length" | "turn" | "edge" | "calm" | "split";

/**
 * A traced axis: vertices ordered upstream → downstream, with signed arc length s (0 at the core,
 * positive downstream) and the unit tangent of the axis itself in the local grid axes.
 */
export interface JetAxis {
  readonly count: number;
  readonly i: Float64Array;
  readonly j: Float64Array;
  readonly s: Float64Array;
  readonly tangentX: Float64Array;
  readonly tangentY: Float64Array;
  /** Scale factors hx, hy at the vertices (m per index step). */
  readonly scaleX: Float64Array;
  readonly scaleY: Float64Array;
  /** Vertex index of the core (where s = 0). */
  readonly coreVertex: number;
  /** How each end came about; a "split" end borders another core's segment, so points near it stay labelled. */
  readonly upstreamStop: AxisStop;
  readonly downstreamStop: AxisStop;
}

export type CurvatureClass = -1 | 0 | 1;

/** One axis vertex as stored and drawn. */
export interface JetAxisVertex {
  readonly lat: number;
  readonly lon: number;
  /** Fractional grid indices. */
  readonly i: number;
  readonly j: number;
  /** Signed distance along the axis from the core (m), positive downstream. */
  readonly s: number;
}

/** A jet streak as reported with the fields of a frame. */
export interface JetStreak {
  /** Number of the streak in this frame (matches nothing across frames). */
  readonly id: number;
  readonly core: { readonly lat: number; readonly lon: number; readonly i: number; readonly j: number; readonly speed: number };
  readonly hemisphere: "north" | "south";
  readonly axis: readonly JetAxisVertex[];
  /** −1 anticyclonic, 0 straight, 1 cyclonic. */
  readonly curvatureClass: CurvatureClass;
  readonly curvatureStrong: boolean;
  /** Turning of the axis over the curvature window (degrees), positive cyclonic. */
  readonly turningAngleDegrees: number;
  /** Grid points labelled as belonging to this streak. */
  readonly labelledPoints: number;
}
