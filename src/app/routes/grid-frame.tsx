import { useParams } from "react-router-dom";
import { NotFound } from "@/components/errors/not-found.tsx";
import { FrameMapPage } from "@/features/grids/components/map/frame-map-page.tsx";
import { addMapOverlays } from "@/features/grids/components/map/map-overlays.tsx";
import { StormReportsLayer } from "@/features/history/components/storm-reports-layer.tsx";

// Storm reports belong to the history feature; the route puts them on the grids map.
addMapOverlays([
  { id: "storm-reports", label: "Storm reports (±1 h)", visibleByDefault: true, render: ({ frame }) => <StormReportsLayer validTime={frame.validTime} /> },
]);

/** Lazy route module: the map viewer of `/grids/frames/:frameId`. */
export function Component() {
  const { frameId } = useParams();
  const id = Number(frameId);
  if (!Number.isInteger(id) || id <= 0) return <NotFound />;
  return <FrameMapPage frameId={id} />;
}
