import { useParams } from "react-router-dom";
import { NotFound } from "@/components/errors/not-found.tsx";
import { FrameMapPage } from "@/features/grids/components/map/frame-map-page.tsx";

/** Lazy route module: the map viewer of `/grids/frames/:frameId`. */
export function Component() {
  const { frameId } = useParams();
  const id = Number(frameId);
  if (!Number.isInteger(id) || id <= 0) return <NotFound />;
  return <FrameMapPage frameId={id} />;
}
