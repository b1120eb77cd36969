import type { ThermoPoint } from "./skew-t-geometry.ts";

/**
 * The shaded areas of the skew-T: where the chosen parcel is warmer than its surroundings between its LFC and
 * EL (the CAPE) and where it is colder between its origin and LFC (the CIN). The buoyancy difference Δ is taken
 * as linear in ln p between nodes and split at its zero crossings, the same bookkeeping the column library
 * integrates, so each area is exactly the integral it stands for (Rd × area in ln p–K space).
 */

export type BuoyancyAreaKind = "positive" | "negative";

export interface BuoyancyArea {
  kind: BuoyancyAreaKind;
  /** Parcel side, from the bottom of the area up. */
  parcel: ThermoPoint[];
  /** Environment side, from the bottom of the area up (draw it reversed to close the polygon). */
  environment: ThermoPoint[];
}

export interface ParcelPath {
  pressure: readonly (number | null)[];
  /** The compared temperature of the parcel (virtual temperature when the correction is on), K. */
  value: readonly (number | null)[];
  lfcPressure: number | null;
  elPressure: number | null;
}

interface Node {
  lnP: number;
  parcel: number;
  env: number;
}

const delta = (n: Node) => n.parcel - n.env;

function lerpNode(a: Node, b: Node, f: number): Node {
  return { lnP: a.lnP + f * (b.lnP - a.lnP), parcel: a.parcel + f * (b.parcel - a.parcel), env: a.env + f * (b.env - a.env) };
}

/** The nodes between two ln p bounds (lnHigh ≥ lnLow), with the bounds inserted by interpolation. */
function clip(nodes: readonly Node[], lnHigh: number, lnLow: number): Node[] {
  const out: Node[] = [];
  for (let k = 0; k < nodes.length; k++) {
    const n = nodes[k];
    if (n.lnP <= lnHigh && n.lnP >= lnLow) out.push(n);
    const next = nodes[k + 1];
    if (!next) break;
    for (const bound of [lnHigh, lnLow]) {
      // A bound strictly inside this segment becomes a node of its own.
      if ((n.lnP > bound && next.lnP < bound) || (n.lnP < bound && next.lnP > bound)) {
        out.push(lerpNode(n, next, (n.lnP - bound) / (n.lnP - next.lnP)));
      }
    }
  }
  return out.sort((a, b) => b.lnP - a.lnP);
}

/** Maximal runs where sign·Δ > 0, with zero crossings inserted as shared end nodes. */
function signedRuns(nodes: readonly Node[], sign: 1 | -1): Node[][] {
  const runs: Node[][] = [];
  let run: Node[] = [];
  const close = () => {
    if (run.length >= 2) runs.push(run);
    run = [];
  };
  for (let k = 0; k < nodes.length; k++) {
    const a = nodes[k];
    const da = sign * delta(a);
    if (da > 0) run.push(a);
    const b = nodes[k + 1];
    if (!b) break;
    const db = sign * delta(b);
    if ((da > 0 && db < 0) || (da < 0 && db > 0)) {
      const zero = lerpNode(a, b, da / (da - db));
      if (da > 0) {
        run.push(zero);
        close();
      } else {
        run = [zero];
      }
    } else if (da > 0 && db === 0) {
      run.push(b);
      close();
    } else if (da === 0 && db > 0 && run.length === 0) {
      run = [a];
    } else if (da <= 0) {
      close();
    }
  }
  close();
  return runs;
}

function toArea(kind: BuoyancyAreaKind, run: readonly Node[]): BuoyancyArea {
  return {
    kind,
    parcel: run.map((n) => ({ pressure: Math.exp(n.lnP), temperature: n.parcel })),
    environment: run.map((n) => ({ pressure: Math.exp(n.lnP), temperature: n.env })),
  };
}

/**
 * CAPE and CIN areas of one parcel. `environmentAt(p)` gives the environment value the parcel is compared
 * with at a node pressure. No LFC means no CAPE and an undefined CIN, so nothing is shaded.
 */
export function buoyancyAreas(path: ParcelPath, environmentAt: (pressure: number) => number): BuoyancyArea[] {
  const nodes: Node[] = [];
  for (let k = 0; k < path.pressure.length; k++) {
    const p = path.pressure[k];
    const t = path.value[k];
    if (p === null || t === null || !(p > 0) || !Number.isFinite(t)) continue;
    const env = environmentAt(p);
    if (!Number.isFinite(env)) continue;
    nodes.push({ lnP: Math.log(p), parcel: t, env });
  }
  if (nodes.length < 2 || path.lfcPressure === null) return [];
  const lnOrigin = nodes[0].lnP;
  const lnLfc = Math.log(path.lfcPressure);
  const lnEl = path.elPressure === null ? nodes[nodes.length - 1].lnP : Math.log(path.elPressure);
  return [
    ...signedRuns(clip(nodes, lnLfc, lnEl), 1).map((run) => toArea("positive", run)),
    ...signedRuns(clip(nodes, lnOrigin, lnLfc), -1).map((run) => toArea("negative", run)),
  ];
}

/** Signed area of one shaded region in ln p–K space (∫ Δ d ln p, positive for CAPE); × Rd gives J/kg. */
export function areaInLnPressure(area: BuoyancyArea): number {
  let sum = 0;
  for (let k = 0; k < area.parcel.length - 1; k++) {
    const a = area.parcel[k];
    const b = area.parcel[k + 1];
    const da = a.temperature - area.environment[k].temperature;
    const db = b.temperature - area.environment[k + 1].temperature;
    // Trapezoid in ln p, integrating upward (toward lower pressure) as the library does.
    sum += 0.5 * (da + db) * (Math.log(a.pressure) - Math.log(b.pressure));
  }
  return sum;
}
