/**
 * The one query-key factory for grids: live events and uploads invalidate through it. Field values
 * and map outlines have their keys in the map kit (`mapKeys`), under the same "grids" root.
 */
export const gridKeys = {
  all: ["grids"] as const,
  jobs: () => [...gridKeys.all, "jobs"] as const,
  runs: () => [...gridKeys.all, "runs"] as const,
  frames: () => [...gridKeys.all, "frame"] as const,
  frame: (frameId: number) => [...gridKeys.frames(), frameId] as const,
  jetStreaks: (frameId: number) => [...gridKeys.frame(frameId), "jet-streaks"] as const,
};
