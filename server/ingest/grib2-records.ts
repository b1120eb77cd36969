import { STANDARD_GRAVITY } from "../../shared/meteo/constants.ts";
import type { Grib2Message } from "./grib2/index.ts";
import type { GridRecord, LevelKind, ModelParameter } from "./grid-record.ts";

/**
 * Originating centres by WMO Common Code Table C-11 (the few an office is likely to receive), and
 * Bellwether's own invented demo model (local centre 255, sub-centre 77).
 */
const CENTRES: Record<string, string> = {
  "7": "NCEP",
  "34": "JMA",
  "54": "CMC",
  "74": "UK Met Office",
  "78": "DWD",
  "85": "Météo-France",
  "98": "ECMWF",
  "255/77": "Bellwether demo model (invented)",
};

export function modelName(centre: number, subCentre: number, ensemble: Grib2Message["ensemble"]): string {
  const name = CENTRES[`${centre}/${subCentre}`] ?? CENTRES[String(centre)] ?? `centre ${centre}${subCentre ? `/${subCentre}` : ""}`;
  return ensemble ? `${name} member ${ensemble.perturbation}` : name;
}

const LEVELS: Record<string, LevelKind> = { isobaric: "isobaric", surface: "surface", heightAboveGround: "height_above_ground" };

/** WMO Code Table 4.2 (discipline/category/number) → the quantity frame assembly knows. */
const PARAMETERS: Record<string, ModelParameter> = {
  "0/0/0": "temperature",
  "0/0/6": "dewpoint",
  "0/1/0": "specific_humidity",
  "0/1/1": "relative_humidity",
  "0/2/2": "u_wind",
  "0/2/3": "v_wind",
  "0/3/0": "pressure",
  "0/3/4": "geopotential_height",
  "0/3/5": "geopotential_height",
  "2/0/7": "surface_height",
};

function parameterOf(m: Grib2Message, levelKind: LevelKind): ModelParameter | null {
  // Statistically processed fields (accumulations, maxima) are never state variables.
  if (m.statistics || m.secondLevel) return null;
  const parameter = PARAMETERS[`${m.discipline}/${m.category}/${m.number}`] ?? null;
  if (parameter === "geopotential_height" && levelKind === "surface") return "surface_height";
  if (parameter === "pressure" && levelKind !== "surface") return null;
  return parameter;
}

/** SI conversions frame assembly expects: RH as a fraction, geopotential as height. */
function toSi(m: Grib2Message): Float32Array {
  const key = `${m.discipline}/${m.category}/${m.number}`;
  const scale = key === "0/1/1" ? 0.01 : key === "0/3/4" ? 1 / STANDARD_GRAVITY : 1;
  if (scale === 1) return m.values;
  const out = new Float32Array(m.values.length);
  for (let i = 0; i < out.length; i++) out[i] = m.values[i]! * scale;
  return out;
}

export function grib2ToRecords(messages: readonly Grib2Message[]): GridRecord[] {
  return messages.map((m) => {
    const levelKind = LEVELS[m.levelType] ?? "other";
    const parameter = parameterOf(m, levelKind);
    return {
      parameter,
      sourceName: `${m.parameter.shortName} (${m.discipline}-${m.category}-${m.number})`,
      levelKind,
      level: m.level,
      model: modelName(m.centre, m.subCentre, m.ensemble),
      runTime: m.refTime,
      validTime: m.validTime,
      geometry: m.geometry,
      values: parameter ? toSi(m) : m.values,
    };
  });
}
