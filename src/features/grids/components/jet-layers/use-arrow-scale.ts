import { useMemo } from "react";
import type { MapFrame } from "../../api/get-frame.ts";
import { ARROW_SPACING_PX } from "../../jet-layers/ageostrophic-arrows.ts";
import { chooseArrowScale, speedPercentile90 } from "../../jet-layers/arrow-scale.ts";
import { useJetField } from "./use-jet-field.ts";

/** Nine arrows in ten are kept within this share of the spacing, leaving a clear gap between neighbours. */
const ARROW_REACH = 0.75;

/** The frame's ageostrophic wind and the one arrow scale the map and the legend's key arrow share. */
export function useAgeostrophicWind(frame: MapFrame) {
  const u = useJetField(frame, "jet_uag");
  const v = useJetField(frame, "jet_vag");
  const scale = useMemo(
    () => (u.data && v.data ? chooseArrowScale(speedPercentile90(u.data.values, v.data.values), ARROW_SPACING_PX * ARROW_REACH) : null),
    [u.data, v.data],
  );
  return { u: u.data ?? null, v: v.data ?? null, scale, isError: u.isError || v.isError };
}
