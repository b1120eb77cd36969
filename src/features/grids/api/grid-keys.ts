/** The one query-key factory for grids: live events and uploads invalidate through it. */
export const gridKeys = {
  all: ["grids"] as const,
  jobs: () => [...gridKeys.all, "jobs"] as const,
  runs: () => [...gridKeys.all, "runs"] as const,
  frames: () => [...gridKeys.all, "frame"] as const,
  frame: (frameId: number) => [...gridKeys.frames(), frameId] as const,
  field: (frameId: number, key: string) => [...gridKeys.all, "field", frameId, key] as const,
  outlineLines: () => [...gridKeys.all, "outline-lines"] as const,
};
