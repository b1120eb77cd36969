/**
 * Query keys for what the map loads itself: a frame's field values and the outline files. They sit
 * under the "grids" root so that whatever refreshes grid data refreshes these too, on every page
 * that shows a map.
 */
export const mapKeys = {
  field: (frameId: number, key: string) => ["grids", "field", frameId, key] as const,
  outlineLines: () => ["grids", "outline-lines"] as const,
};
