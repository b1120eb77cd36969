import type { ExtraDiagnoser } from "./frame-processor.ts";

/** The horizontal diagnostics every frame gets besides the column fields (jet-level fields: issue 5). */
export function frameExtraDiagnosers(): ExtraDiagnoser[] {
  return [];
}
