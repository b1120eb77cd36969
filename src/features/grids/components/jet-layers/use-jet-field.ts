import { useFieldValues } from "@/components/map/index.ts";
import type { MapFrame } from "../../api/get-frame.ts";

/** One stored jet field of the frame (loaded once and shared by every layer and legend that asks). */
export function useJetField(frame: MapFrame, key: string) {
  const stored = frame.fields.some((field) => field.key === key);
  return useFieldValues(frame.id, stored ? key : null, frame.geometry);
}

/** Why the jet layers cannot be drawn on this frame, or null when they can. */
export function jetLayersUnavailable(frame: MapFrame): string | null {
  return frame.fields.some((field) => field.key === "jet_quadrant") ? null : "this frame has no jet fields";
}
