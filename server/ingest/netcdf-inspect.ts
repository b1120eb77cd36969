import type { InspectableField } from "../cli/commands/inspect.command.ts";

/** NetCDF variables as inspect entries (one per variable and level, in variable order). */
export async function decodeNetcdfForInspect(_bytes: Uint8Array): Promise<InspectableField[]> {
  // Wired when the NetCDF decoder lands (issue 4).
  throw new Error("NetCDF inspection is being wired in.");
}
