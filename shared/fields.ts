/**
 * The field catalogue: the one list of every diagnostic Bellwether stores, with its storage unit (SI),
 * display unit, QC range, theme and plain meaning. Rules, the grid store, the CLI and the client all read
 * field keys from here. Values outside a field's QC range become NaN in grids and null in JSON.
 */

export type FieldKind = "number" | "bool" | "category";
export type FieldTheme = "buoyancy" | "shear" | "helicity" | "moisture" | "lapse" | "composite" | "jet" | "frontogenesis";
/** 'column' fields come from the per-column library; 'jet' fields from the horizontal upper-level operators. */
export type FieldSource = "column" | "jet";

export interface FieldCategory {
  readonly code: number;
  readonly label: string;
}

/** display = stored × scale + offset, shown with `decimals` digits. */
export interface DisplayUnit {
  readonly unit: string;
  readonly scale: number;
  readonly offset: number;
  readonly decimals: number;
}

export interface FieldDefinition {
  readonly key: string;
  readonly kind: FieldKind;
  readonly unit: string;
  readonly display: DisplayUnit;
  /** Inclusive QC range in storage units. */
  readonly range: readonly [number, number];
  readonly theme: FieldTheme;
  readonly source: FieldSource;
  readonly meaning: string;
  readonly categories?: readonly FieldCategory[];
}

const KNOTS_PER_MPS = 3600 / 1852;

const same = (unit: string, decimals: number): DisplayUnit => ({ unit, scale: 1, offset: 0, decimals });
const knots: DisplayUnit = { unit: "kt", scale: KNOTS_PER_MPS, offset: 0, decimals: 0 };
const metresAgl: DisplayUnit = same("m AGL", 0);
const energy: DisplayUnit = same("J/kg", 0);
const helicity: DisplayUnit = same("m²/s²", 0);
const index: DisplayUnit = same("", 2);
const flag: DisplayUnit = same("", 0);
const perSecond5: DisplayUnit = { unit: "10⁻⁵ s⁻¹", scale: 1e5, offset: 0, decimals: 1 };
const kilometres: DisplayUnit = { unit: "km", scale: 1e-3, offset: 0, decimals: 0 };

const CAPE_RANGE = [0, 10000] as const;
const CIN_RANGE = [-1500, 0] as const;
const LCL_RANGE = [0, 6000] as const;
const LEVEL_RANGE = [0, 20000] as const;
const SHEAR_RANGE = [0, 100] as const;
const WIND_RANGE = [-100, 100] as const;
const SRH_RANGE = [-1500, 2000] as const;
const BOOL_RANGE = [0, 1] as const;

function column(key: string, kind: FieldKind, unit: string, display: DisplayUnit, range: readonly [number, number], theme: FieldTheme, meaning: string): FieldDefinition {
  return { key, kind, unit, display, range, theme, source: "column", meaning };
}
function jet(key: string, kind: FieldKind, unit: string, display: DisplayUnit, range: readonly [number, number], meaning: string, categories?: readonly FieldCategory[]): FieldDefinition {
  return categories ? { key, kind, unit, display, range, theme: "jet", source: "jet", meaning, categories } : { key, kind, unit, display, range, theme: "jet", source: "jet", meaning };
}

const COLUMN_FIELDS = [
  column("sbcape", "number", "J kg-1", energy, CAPE_RANGE, "buoyancy", "Convective available potential energy of a parcel lifted from the surface."),
  column("sbcin", "number", "J kg-1", energy, CIN_RANGE, "buoyancy", "Convective inhibition of the surface parcel below its level of free convection."),
  column("sblcl_hgt", "number", "m", metresAgl, LCL_RANGE, "buoyancy", "Height above ground where the surface parcel saturates (cloud base)."),
  column("sblfc_hgt", "number", "m", metresAgl, LEVEL_RANGE, "buoyancy", "Height above ground where the surface parcel becomes freely buoyant."),
  column("sbel_hgt", "number", "m", metresAgl, LEVEL_RANGE, "buoyancy", "Height above ground where the surface parcel stops being buoyant (storm top estimate)."),
  column("mlcape", "number", "J kg-1", energy, CAPE_RANGE, "buoyancy", "CAPE of a parcel with the mean properties of the lowest 100 hPa."),
  column("mlcin", "number", "J kg-1", energy, CIN_RANGE, "buoyancy", "Convective inhibition of the lowest-100-hPa mean parcel."),
  column("mllcl_hgt", "number", "m", metresAgl, LCL_RANGE, "buoyancy", "Cloud-base height of the lowest-100-hPa mean parcel."),
  column("mllfc_hgt", "number", "m", metresAgl, LEVEL_RANGE, "buoyancy", "Level of free convection of the lowest-100-hPa mean parcel."),
  column("mlel_hgt", "number", "m", metresAgl, LEVEL_RANGE, "buoyancy", "Equilibrium level of the lowest-100-hPa mean parcel."),
  column("mucape", "number", "J kg-1", energy, CAPE_RANGE, "buoyancy", "CAPE of the parcel with the highest equivalent potential temperature in the lowest 300 hPa."),
  column("mucin", "number", "J kg-1", energy, CIN_RANGE, "buoyancy", "Convective inhibition of the most-unstable parcel."),
  column("mu_src_pres", "number", "Pa", { unit: "hPa", scale: 0.01, offset: 0, decimals: 0 }, [10000, 110000], "buoyancy", "Pressure the most-unstable parcel starts from."),
  column("muel_hgt", "number", "m", metresAgl, LEVEL_RANGE, "buoyancy", "Equilibrium level of the most-unstable parcel."),
  column("thetae_sfc", "number", "K", same("K", 1), [250, 400], "moisture", "Equivalent potential temperature of the surface air (heat plus moisture content)."),
  column("lapse_0_3km", "number", "K km-1", same("K/km", 1), [-20, 15], "lapse", "Rate at which temperature falls with height over the lowest 3 km."),
  column("lapse_700_500", "number", "K km-1", same("K/km", 1), [-10, 12], "lapse", "Rate at which temperature falls with height between 700 and 500 hPa."),
  column("pwat", "number", "kg m-2", same("mm", 1), [0, 100], "moisture", "Depth of liquid water if all vapour between the surface and 300 hPa condensed."),
  column("shear_0_1km", "number", "m s-1", knots, SHEAR_RANGE, "shear", "Wind difference between 10 m and 1 km above ground."),
  column("shear_0_3km", "number", "m s-1", knots, SHEAR_RANGE, "shear", "Wind difference between 10 m and 3 km above ground."),
  column("shear_0_6km", "number", "m s-1", knots, SHEAR_RANGE, "shear", "Wind difference between 10 m and 6 km above ground (deep-layer shear)."),
  column("meanwind_0_6km_u", "number", "m s-1", knots, WIND_RANGE, "shear", "Eastward part of the height-averaged wind over the lowest 6 km."),
  column("meanwind_0_6km_v", "number", "m s-1", knots, WIND_RANGE, "shear", "Northward part of the height-averaged wind over the lowest 6 km."),
  column("storm_rm_u", "number", "m s-1", knots, WIND_RANGE, "shear", "Eastward part of the expected right-moving supercell motion."),
  column("storm_rm_v", "number", "m s-1", knots, WIND_RANGE, "shear", "Northward part of the expected right-moving supercell motion."),
  column("storm_lm_u", "number", "m s-1", knots, WIND_RANGE, "shear", "Eastward part of the expected left-moving supercell motion."),
  column("storm_lm_v", "number", "m s-1", knots, WIND_RANGE, "shear", "Northward part of the expected left-moving supercell motion."),
  column("srh_0_1km", "number", "m2 s-2", helicity, SRH_RANGE, "helicity", "Spin available to a right-moving storm's inflow in the lowest 1 km."),
  column("srh_0_3km", "number", "m2 s-2", helicity, SRH_RANGE, "helicity", "Spin available to a right-moving storm's inflow in the lowest 3 km."),
  column("eff_present", "bool", "1", flag, BOOL_RANGE, "helicity", "1 when a layer of air able to feed a storm (effective inflow layer) exists, else 0."),
  column("eff_base_hgt", "number", "m", metresAgl, LCL_RANGE, "helicity", "Bottom of the effective inflow layer above ground."),
  column("eff_top_hgt", "number", "m", metresAgl, LCL_RANGE, "helicity", "Top of the effective inflow layer above ground."),
  column("srh_eff", "number", "m2 s-2", helicity, SRH_RANGE, "helicity", "Storm-relative helicity of the effective inflow layer."),
  column("shear_eff", "number", "m s-1", knots, SHEAR_RANGE, "shear", "Wind difference over the lower half of the storm depth from the effective inflow base."),
  column("scp_eff", "number", "1", index, [-100, 200], "composite", "Supercell composite from most-unstable CAPE, effective helicity and effective shear."),
  column("scp_fixed", "number", "1", index, [-100, 200], "composite", "Supercell composite from fixed layers (disabled until its normaliser is confirmed)."),
  column("stp_fixed", "number", "1", index, [-50, 50], "composite", "Significant tornado parameter from surface CAPE, cloud base, 0-1 km helicity and deep shear."),
  column("stp_eff", "number", "1", index, [-50, 50], "composite", "Significant tornado parameter from mixed-layer CAPE and CIN, cloud base and effective-layer terms."),
] as const satisfies readonly FieldDefinition[];

const QUADRANTS: readonly FieldCategory[] = [
  { code: 0, label: "none" },
  { code: 1, label: "left_entrance" },
  { code: 2, label: "right_entrance" },
  { code: 3, label: "left_exit" },
  { code: 4, label: "right_exit" },
  { code: 5, label: "core" },
];
const CURVATURE_CLASSES: readonly FieldCategory[] = [
  { code: -1, label: "anticyclonic" },
  { code: 0, label: "straight" },
  { code: 1, label: "cyclonic" },
];

const JET_FIELDS = [
  jet("jet_speed", "number", "m s-1", knots, [0, 150], "Smoothed wind speed at the jet level."),
  jet("jet_ug", "number", "m s-1", knots, [-200, 200], "Eastward geostrophic wind at the jet level."),
  jet("jet_vg", "number", "m s-1", knots, [-200, 200], "Northward geostrophic wind at the jet level."),
  jet("jet_uag", "number", "m s-1", knots, WIND_RANGE, "Eastward ageostrophic wind at the jet level."),
  jet("jet_vag", "number", "m s-1", knots, WIND_RANGE, "Northward ageostrophic wind at the jet level."),
  jet("jet_div", "number", "s-1", perSecond5, [-5e-4, 5e-4], "Horizontal divergence of the smoothed jet-level wind (positive: spreading out)."),
  jet("jet_vort", "number", "s-1", perSecond5, [-1e-3, 1e-3], "Relative vorticity of the smoothed jet-level wind."),
  jet("jet_along_accel", "number", "m s-2", { unit: "m/s/h", scale: 3600, offset: 0, decimals: 1 }, [-0.05, 0.05], "Speed change felt by air moving with the flow (positive entering, negative leaving a streak)."),
  jet("jet_curv", "number", "m-1", { unit: "per 1000 km", scale: 1e6, offset: 0, decimals: 2 }, [-1e-5, 1e-5], "Streamline curvature, positive when cyclonic."),
  jet("jet_quadrant", "category", "1", flag, [0, 5], "Which part of a jet streak the point lies in.", QUADRANTS),
  jet("jet_left_exit", "bool", "1", flag, BOOL_RANGE, "1 in the left exit quadrant of a jet streak."),
  jet("jet_right_entrance", "bool", "1", flag, BOOL_RANGE, "1 in the right entrance quadrant of a jet streak."),
  jet("jet_exit", "bool", "1", flag, BOOL_RANGE, "1 in either exit quadrant of a jet streak."),
  jet("jet_entrance", "bool", "1", flag, BOOL_RANGE, "1 in either entrance quadrant of a jet streak."),
  jet("jet_curv_class", "category", "1", flag, [-1, 1], "Whether the jet axis near its core bends anticyclonically, runs straight or bends cyclonically.", CURVATURE_CLASSES),
  jet("jet_curv_strong", "bool", "1", flag, BOOL_RANGE, "1 when the jet axis turns by 30 degrees or more near its core."),
  jet("jet_div_favoured", "bool", "1", flag, BOOL_RANGE, "1 where the jet streak's shape and hemisphere favour upper divergence."),
  jet("jet_div_ambiguous", "bool", "1", flag, BOOL_RANGE, "1 where a straight-streak divergent quadrant is put in doubt by the axis curvature."),
  jet("jet_ascent_support", "bool", "1", flag, BOOL_RANGE, "1 where divergence is favoured and the computed divergence is notable."),
  jet("jet_along_dist", "number", "m", kilometres, [-3e6, 3e6], "Distance along the jet axis from the core, positive downstream."),
  jet("jet_axis_dist", "number", "m", kilometres, [-1e6, 1e6], "Distance from the jet axis, positive on its left side."),
  jet("jet_core_speed", "number", "m s-1", knots, [0, 150], "Speed of the jet core this point is assigned to."),
  {
    key: "fgen_850", kind: "number", unit: "K (100 km)-1 (3 h)-1", display: same("K/100km/3h", 2), range: [-50, 50],
    theme: "frontogenesis", source: "jet", meaning: "Rate at which horizontal temperature contrast at 850 hPa is sharpening (positive) or weakening.",
  },
  {
    key: "fgen_700", kind: "number", unit: "K (100 km)-1 (3 h)-1", display: same("K/100km/3h", 2), range: [-50, 50],
    theme: "frontogenesis", source: "jet", meaning: "Rate at which horizontal temperature contrast at 700 hPa is sharpening (positive) or weakening.",
  },
] as const satisfies readonly FieldDefinition[];

export type ColumnFieldKey = (typeof COLUMN_FIELDS)[number]["key"];
export type JetFieldKey = (typeof JET_FIELDS)[number]["key"];
export type FieldKey = ColumnFieldKey | JetFieldKey;

export const FIELDS: readonly FieldDefinition[] = [...COLUMN_FIELDS, ...JET_FIELDS];
export const FIELD_KEYS: readonly FieldKey[] = FIELDS.map((f) => f.key as FieldKey);
/** Column fields in the fixed order the column library writes them. */
export const COLUMN_FIELD_KEYS: readonly ColumnFieldKey[] = COLUMN_FIELDS.map((f) => f.key);
export const JET_FIELD_KEYS: readonly JetFieldKey[] = JET_FIELDS.map((f) => f.key);

const BY_KEY = new Map<string, FieldDefinition>(FIELDS.map((f) => [f.key, f]));

/** The definition of a field, or undefined for an unknown key. */
export function fieldByKey(key: string): FieldDefinition | undefined {
  return BY_KEY.get(key);
}

export function isFieldKey(key: string): key is FieldKey {
  return BY_KEY.has(key);
}

/** QC: a value inside the field's range passes unchanged; anything else (or NaN) becomes NaN. */
export function applyFieldRange(field: FieldDefinition, value: number): number {
  return value >= field.range[0] && value <= field.range[1] ? value : Number.NaN;
}

/** Storage value -> display value (e.g. m s⁻¹ -> kt). NaN stays NaN. */
export function toDisplayUnit(field: FieldDefinition, value: number): number {
  return value * field.display.scale + field.display.offset;
}
