import { BuoyancyResult } from "./buoyancy-bookkeeping.ts";
import { ParcelResult } from "./parcel-result.ts";
import { EffectiveLayer } from "./effective-inflow-layer.ts";
import { WindVector } from "../kinematics/wind-profile.ts";

/**
 * Scratch memory for one column, reused from column to column so the hot path allocates nothing.
 *
 * Levels (§ column preparation): index 0 is the surface (2-m T and humidity, 10-m wind, z = 0), then the
 * isobaric levels above ground in order of decreasing pressure, stopping at 100 hPa. Heights are metres
 * above ground. Per-level derived values (ln p, Exner factor, mixing ratio, Tv, table row) are filled by
 * the loaders in column-loader.ts.
 */
export class ColumnWorkspace {
  readonly capacity: number;
  count = 0;

  readonly pressure: Float64Array;
  readonly lnPressure: Float64Array;
  /** (p / p00)^κ, so a dry-adiabat temperature is θ × exner. */
  readonly exner: Float64Array;
  readonly temperature: Float64Array;
  readonly dewpoint: Float64Array;
  readonly vaporPressure: Float64Array;
  readonly mixingRatio: Float64Array;
  readonly virtualTemperature: Float64Array;
  readonly height: Float64Array;
  readonly u: Float64Array;
  readonly v: Float64Array;
  /** Fractional row of ln p in the pseudo-adiabat table (NaN outside it). */
  readonly tableRow: Float64Array;

  // Parcel nodes: origin, the levels above it and the inserted LCL.
  nodeCount = 0;
  lclNode = -1;
  readonly nodeLnPressure: Float64Array;
  readonly nodeHeight: Float64Array;
  readonly nodeDelta: Float64Array;
  readonly nodeParcelTemperature: Float64Array;
  readonly nodeParcelVirtualTemperature: Float64Array;
  /** When true the table path also looks up parcel T (for reports); the hot path only needs Tv. */
  recordParcelTemperature = false;

  readonly buoyancy = new BuoyancyResult();
  readonly surfaceParcel = new ParcelResult();
  readonly mixedLayerParcel = new ParcelResult();
  readonly mostUnstableParcel = new ParcelResult();
  readonly scratchParcel = new ParcelResult();
  readonly effectiveLayer = new EffectiveLayer();
  readonly meanWind0To6Km = new WindVector();
  readonly rightMover = new WindVector();
  readonly leftMover = new WindVector();
  readonly scratchVector = new WindVector();
  readonly scratchVector2 = new WindVector();

  constructor(capacity: number) {
    this.capacity = capacity;
    this.pressure = new Float64Array(capacity);
    this.lnPressure = new Float64Array(capacity);
    this.exner = new Float64Array(capacity);
    this.temperature = new Float64Array(capacity);
    this.dewpoint = new Float64Array(capacity);
    this.vaporPressure = new Float64Array(capacity);
    this.mixingRatio = new Float64Array(capacity);
    this.virtualTemperature = new Float64Array(capacity);
    this.height = new Float64Array(capacity);
    this.u = new Float64Array(capacity);
    this.v = new Float64Array(capacity);
    this.tableRow = new Float64Array(capacity);
    const nodes = capacity + 1;
    this.nodeLnPressure = new Float64Array(nodes);
    this.nodeHeight = new Float64Array(nodes);
    this.nodeDelta = new Float64Array(nodes);
    this.nodeParcelTemperature = new Float64Array(nodes);
    this.nodeParcelVirtualTemperature = new Float64Array(nodes);
  }
}
