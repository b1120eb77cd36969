import type { MapOverlay, MapOverlayGroup } from "../map/map-overlays.tsx";
import { AgeostrophicArrowsLayer } from "./ageostrophic-arrows-layer.tsx";
import { JetAxesLayer } from "./jet-axes-layer.tsx";
import { JetIsotachLabelsLayer, JetIsotachsLayer } from "./jet-isotachs-layer.tsx";
import { JET_LAYER_IDS } from "./jet-layer-ids.ts";
import { JetLegend } from "./jet-legend.tsx";
import { JetQuadrantLabelsLayer, JetQuadrantsLayer } from "./jet-quadrants-layer.tsx";
import { jetLayersUnavailable } from "./use-jet-field.ts";

export const JET_GROUP_ID = "jet-level";

/** The "Jet level" group: its toggles sit together, and one legend explains whichever of them are on. */
export const JET_OVERLAY_GROUP: MapOverlayGroup = {
  id: JET_GROUP_ID,
  label: "Jet level",
  legend: ({ frame }, visible) => <JetLegend frame={frame} visible={visible} />,
};

const unavailableReason: MapOverlay["unavailableReason"] = ({ frame }) => jetLayersUnavailable(frame);

/** The shading lies low (just above the field); lines, arrows and the axis come above coasts and contours. */
export const JET_SHADING_OVERLAYS: readonly MapOverlay[] = [
  {
    id: JET_LAYER_IDS.quadrants,
    label: "Quadrants and divergence",
    group: JET_GROUP_ID,
    visibleByDefault: false,
    unavailableReason,
    render: ({ frame }) => <JetQuadrantsLayer frame={frame} />,
    labels: ({ frame }) => <JetQuadrantLabelsLayer frame={frame} />,
  },
];

export const JET_LINE_OVERLAYS: readonly MapOverlay[] = [
  {
    id: JET_LAYER_IDS.isotachs,
    label: "Isotachs (kt)",
    group: JET_GROUP_ID,
    visibleByDefault: false,
    unavailableReason,
    render: ({ frame }) => <JetIsotachsLayer frame={frame} />,
    labels: ({ frame }) => <JetIsotachLabelsLayer frame={frame} />,
  },
  {
    id: JET_LAYER_IDS.arrows,
    label: "Ageostrophic wind",
    group: JET_GROUP_ID,
    visibleByDefault: false,
    unavailableReason,
    render: ({ frame }) => <AgeostrophicArrowsLayer frame={frame} />,
  },
  {
    id: JET_LAYER_IDS.axes,
    label: "Streak axes and cores",
    group: JET_GROUP_ID,
    visibleByDefault: false,
    unavailableReason,
    render: ({ frame }) => <JetAxesLayer frame={frame} />,
  },
];
