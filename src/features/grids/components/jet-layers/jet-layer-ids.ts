/** The jet-level overlays' ids, as they appear in the map's address (`?show=jet-axes,jet-isotachs`). */
export const JET_LAYER_IDS = {
  quadrants: "jet-quadrants",
  isotachs: "jet-isotachs",
  arrows: "jet-arrows",
  axes: "jet-axes",
} as const;
export type JetLayerId = keyof typeof JET_LAYER_IDS;
