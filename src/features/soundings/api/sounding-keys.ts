/** The one query-key factory for soundings. */
export const soundingKeys = {
  all: ["soundings"] as const,
  columns: () => [...soundingKeys.all, "column"] as const,
  column: (frameId: number, lat: number, lon: number) => [...soundingKeys.columns(), { frameId, lat, lon }] as const,
};
