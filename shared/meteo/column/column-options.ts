import type { PseudoAdiabatMethod } from "../parcel/lift-parcel.ts";

export type Hemisphere = "north" | "south";

export interface ColumnOptions {
  /** Pseudo-adiabat evaluation. Default: 'reference' for single columns, 'table' for grids. */
  pseudoAdiabat?: PseudoAdiabatMethod;
  /**
   * 'north' (default): right-mover conventions. 'south': the left mover drives every helicity field and
   * composites use −SRH so that cyclonic stays positive (a Bellwether proposal, no published source).
   */
  hemisphere?: Hemisphere;
  /** The fixed-layer supercell composite stays null until its SRH normaliser is confirmed. Default false. */
  enableScpFixed?: boolean;
  /** Virtual-temperature correction for CAPE/CIN/LFC/EL. Default true; false exists for comparison tests. */
  virtualCorrection?: boolean;
}

export interface ResolvedColumnOptions {
  pseudoAdiabat: PseudoAdiabatMethod;
  hemisphere: Hemisphere;
  enableScpFixed: boolean;
  virtualCorrection: boolean;
}

export function resolveColumnOptions(options: ColumnOptions | undefined, defaultMethod: PseudoAdiabatMethod): ResolvedColumnOptions {
  return {
    pseudoAdiabat: options?.pseudoAdiabat ?? defaultMethod,
    hemisphere: options?.hemisphere ?? "north",
    enableScpFixed: options?.enableScpFixed ?? false,
    virtualCorrection: options?.virtualCorrection ?? true,
  };
}
