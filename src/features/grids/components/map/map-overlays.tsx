import type { ReactNode } from "react";
import { ContoursLayer, OutlinesLayer, type ColourScale, type FieldValues, type MapField } from "@/components/map/index.ts";
import type { MapFrame } from "../../api/get-frame.ts";

/** What an overlay may draw from: the frame, and the field shown beneath it (once loaded). */
export interface OverlayContext {
  frame: MapFrame;
  field: MapField | null;
  values: FieldValues | null;
  scale: ColourScale | null;
}

/**
 * A layer drawn over the field. To add one (isotachs, jet axes, quadrant shading, arrows), write a
 * component that draws through `LayerCanvas` (it gets the map's viewport from `useMapViewport`
 * and can load any other field of the frame with `useFieldValues`), then add one entry here.
 * The viewer lists every entry as a toggle and stacks visible ones in this order, above the field.
 */
export interface MapOverlay {
  id: string;
  label: string;
  visibleByDefault: boolean;
  /** Why the overlay cannot be drawn right now (shown beside its toggle), or null when it can. */
  unavailableReason?: (context: OverlayContext) => string | null;
  render: (context: OverlayContext) => ReactNode;
}

export const MAP_OVERLAYS: readonly MapOverlay[] = [
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
];

/** Overlay ids shown when the URL does not say. */
export const DEFAULT_OVERLAYS: readonly string[] = MAP_OVERLAYS.filter((overlay) => overlay.visibleByDefault).map((overlay) => overlay.id);
