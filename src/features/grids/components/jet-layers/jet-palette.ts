/**
 * Colours of the jet-level layers: Bellwether's own, chosen to read on the map's dark ground and
 * to stay apart from each other and from the contours of the shown field (white).
 */
export const JET_COLOURS = {
  /** Isotachs: a pale cyan, cool against the warm ramps most fields use. */
  isotach: "#8fe3ff",
  /** Streak axes and cores: a strong gold, the most prominent mark of the group. */
  axis: "#ffd23f",
  /** Ageostrophic arrows: a soft grey-white, present but quieter than the axis. */
  arrow: "#eef1f5",
  /** The dark halo every line and label gets, so it reads over any colour of the field. */
  halo: "rgba(10, 14, 18, 0.8)",
} as const;

/** Lines of the hatching that marks where divergence is favoured (CSS pixels apart). */
export const HATCH_SPACING_PX = 7;
