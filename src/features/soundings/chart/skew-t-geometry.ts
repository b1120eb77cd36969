import { scaleLinear, scaleLog } from "d3-scale";

/**
 * The skew-T log-p coordinate system: height on screen is proportional to −ln p, and isotherms lean to the
 * right by `skew` pixels per pixel of rise (1 gives 45°). Temperatures are K, pressures Pa, screen units px
 * with y growing downward, as in SVG.
 */
export interface SkewTFrame {
  /** Plot box in px. */
  left: number;
  top: number;
  width: number;
  height: number;
  /** Pressure at the bottom and top edge (Pa), bottom > top. */
  bottomPressure: number;
  topPressure: number;
  /** Temperatures at the bottom-left and bottom-right corners (K). */
  leftTemperature: number;
  rightTemperature: number;
  /** Horizontal shift per unit of rise; 1 leans isotherms at 45°. */
  skew: number;
}

export interface SkewTGeometry {
  readonly frame: SkewTFrame;
  yOfPressure(pressure: number): number;
  pressureOfY(y: number): number;
  /** Screen x of temperature (K) at pressure (Pa). */
  xOf(temperature: number, pressure: number): number;
  /** Temperature (K) under screen point (x, y). */
  temperatureAt(x: number, y: number): number;
}

export function createSkewTGeometry(frame: SkewTFrame): SkewTGeometry {
  const bottom = frame.top + frame.height;
  const y = scaleLog().domain([frame.bottomPressure, frame.topPressure]).range([bottom, frame.top]);
  const x = scaleLinear().domain([frame.leftTemperature, frame.rightTemperature]).range([frame.left, frame.left + frame.width]);
  const lean = (screenY: number) => frame.skew * (bottom - screenY);
  return {
    frame,
    yOfPressure: (pressure) => y(pressure),
    pressureOfY: (screenY) => y.invert(screenY),
    xOf: (temperature, pressure) => x(temperature) + lean(y(pressure)),
    temperatureAt: (screenX, screenY) => x.invert(screenX - lean(screenY)),
  };
}

/** A point of a line drawn on the diagram, in physical units. */
export interface ThermoPoint {
  pressure: number;
  temperature: number;
}

/** An SVG path ("M x y L x y …") through the points; points with a non-finite value break the line. */
export function pathThrough(geometry: SkewTGeometry, points: readonly ThermoPoint[]): string {
  let d = "";
  let pen = false;
  for (const { pressure, temperature } of points) {
    if (!Number.isFinite(pressure) || !Number.isFinite(temperature) || pressure <= 0) {
      pen = false;
      continue;
    }
    d += `${pen ? "L" : "M"}${geometry.xOf(temperature, pressure).toFixed(1)} ${geometry.yOfPressure(pressure).toFixed(1)}`;
    pen = true;
  }
  return d;
}
