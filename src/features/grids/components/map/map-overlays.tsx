import type { ReactNode } from "react";
import { ContoursLayer, OutlinesLayer, type ColourScale, type FieldValues, type MapField } from "@/components/map/index.ts";
import type { MapFrame } from "../../api/get-frame.ts";
import { JET_LINE_OVERLAYS, JET_OVERLAY_GROUP, JET_SHADING_OVERLAYS } from "../jet-layers/jet-overlays.tsx";

/** What an overlay may draw from: the frame, and the field shown beneath it (once loaded). */
export interface OverlayContext {
  frame: MapFrame;
  field: MapField | null;
  values: FieldValues | null;
  scale: ColourScale | null;
}

/**
 * A layer drawn over the field. To add one, write a component that draws through `LayerCanvas`
 * (it gets the map's viewport from `useMapViewport` and can load any other field of the frame
 * with `useFieldValues`), then add one entry here (with a `group` to list it under a heading).
 * The viewer lists every entry as a toggle and stacks visible ones in this order, above the field.
 */
export interface MapOverlay {
  id: string;
  label: string;
  visibleByDefault: boolean;
  /** Why the overlay cannot be drawn right now (shown beside its toggle), or null when it can. */
  unavailableReason?: (context: OverlayContext) => string | null;
  render: (context: OverlayContext) => ReactNode;
  /** Words the overlay writes on the map, drawn above every overlay so the lines of later ones never cover them. */
  labels?: (context: OverlayContext) => ReactNode;
  /** Id of the group (in MAP_OVERLAY_GROUPS) whose toggles and legend this overlay shares. */
  group?: string;
}

/** Overlays that belong together: their toggles are listed under one heading, and one legend explains the visible ones. */
export interface MapOverlayGroup {
  id: string;
  label: string;
  /** Shown below the field's legend while any overlay of the group is visible; `visible` lists the visible overlays' ids. */
  legend?: (context: OverlayContext, visible: readonly string[]) => ReactNode;
}

export const MAP_OVERLAY_GROUPS: readonly MapOverlayGroup[] = [JET_OVERLAY_GROUP];

const overlays: MapOverlay[] = [
  ...JET_SHADING_OVERLAYS,
  {
    id: "contours",
    label: "Contours",
    visibleByDefault: false,
    unavailableReason: ({ scale }) => (scale?.kind === "categorical" ? "not for flags or categories" : null),
    render: ({ field, values, scale }) =>
      field && values && scale && scale.kind !== "categorical" ? <ContoursLayer field={field} values={values} scale={scale} /> : null,
  },
  {
    id: "outlines",
    label: "Coasts and borders",
    visibleByDefault: true,
    render: () => <OutlinesLayer />,
  },
  ...JET_LINE_OVERLAYS,
];

/** Every overlay, in drawing order; read it at render time, since the app may add overlays of other features. */
export const MAP_OVERLAYS: readonly MapOverlay[] = overlays;

/**
 * Adds overlays that other features own (features do not import each other, so the app's route
 * module composes them). Call once at module load; an id already listed is skipped.
 */
export function addMapOverlays(extra: readonly MapOverlay[]): void {
  for (const overlay of extra) if (!overlays.some((o) => o.id === overlay.id)) overlays.push(overlay);
}

/** Overlay ids shown when the URL does not say. */
export function defaultOverlays(): readonly string[] {
  return overlays.filter((overlay) => overlay.visibleByDefault).map((overlay) => overlay.id);
}
