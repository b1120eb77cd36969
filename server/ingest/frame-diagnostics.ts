import { computeJetFields, GridScratch, isobaricLevelsFromColumnGrid, jetInputFromLevels, type JetSettings } from "../../shared/meteo/jet/index.ts";
import type { ExtraDiagnoser } from "./frame-processor.ts";

/**
 * The horizontal diagnostics every frame gets besides the column fields: the jet-level fields and
 * frontogenesis, plus the jet streaks found (stored as a document beside the fields).
 */
export function frameExtraDiagnosers(jetSettings?: Partial<JetSettings>): ExtraDiagnoser[] {
  // Scratch arrays are reused frame after frame (frames of one grid have one size).
  let scratch: GridScratch | undefined;
  const jet: ExtraDiagnoser = async (frame) => {
    const { input, warnings } = jetInputFromLevels(frame.geometry, isobaricLevelsFromColumnGrid(frame.grid), frame.validTime, jetSettings);
    scratch ??= new GridScratch();
    const result = computeJetFields(input, jetSettings, { scratch });
    return {
      fields: result.fields,
      documents: {
        "jet-streaks": {
          jetLevelPressure: result.jetLevelPressure,
          streaks: result.streaks,
          warnings: [...warnings, ...result.warnings],
          fallbackDisagreement: result.fallbackDisagreement,
          qcRejected: result.qcRejected,
        },
      },
    };
  };
  return [jet];
}
