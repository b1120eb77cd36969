/** The one query-key factory for zones: every zone mutation invalidates `zoneKeys.all`. */
export const zoneKeys = {
  all: ["zones"] as const,
  list: () => [...zoneKeys.all, "list"] as const,
};
