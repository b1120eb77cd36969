import { Link } from "react-router-dom";
import { paths } from "@/config/paths.ts";
import { SectionBoundary } from "@/components/errors/section-boundary.tsx";
import { Loading } from "@/components/ui/loading.tsx";
import { Notice } from "@/components/ui/notice.tsx";
import { PageHeader } from "@/components/ui/page-header.tsx";
import { isApiError } from "@/lib/api-client.ts";
import { describeError } from "@/lib/describe-error.ts";
import { formatLocalBeside, formatUtcCycle, formatUtcDateTime } from "@/lib/time.ts";
import { useFrame, type MapFrame } from "../../api/get-frame.ts";
import { formatForecastHour } from "../../format-grid-labels.ts";
import { useGridLiveUpdates } from "../../hooks/use-grid-live-updates.ts";
import { FrameMapView } from "./frame-map-view.tsx";

function FrameTitle({ frame }: { frame: MapFrame }) {
  return (
    <span className="font-mono text-xs tabular-nums">
      Run {formatUtcCycle(frame.runTime)} <span className="text-muted">({formatLocalBeside(frame.runTime)})</span> ·{" "}
      {formatForecastHour(frame.forecastHour)} · valid {formatUtcDateTime(frame.validTime)} <span className="text-muted">· {formatLocalBeside(frame.validTime)}</span>
    </span>
  );
}

const backLink = (
  <Link to={paths.grids} className="text-sm text-accent hover:underline">
    ← All runs and jobs
  </Link>
);

/** One frame on the map: loads the frame, then hands it to the viewer. */
export function FrameMapPage({ frameId }: { frameId: number }) {
  useGridLiveUpdates();
  const frame = useFrame(frameId);

  if (frame.isPending) return <Loading label="Loading the frame…" />;
  if (frame.isError) {
    const missing = isApiError(frame.error) && frame.error.status === 404;
    return (
      <>
        <PageHeader title="Map" actions={backLink} />
        <Notice tone={missing ? "caution" : "danger"} title={missing ? `Frame ${frameId} is not stored` : "Could not load the frame"}>
          {missing
            ? "A newer file for the same run and valid time may have replaced it, or the retention setting removed its run."
            : describeError(frame.error).message}
        </Notice>
      </>
    );
  }
  return (
    <>
      <PageHeader title={`${frame.data.model} · ${formatForecastHour(frame.data.forecastHour)}`} description={<FrameTitle frame={frame.data} />} actions={backLink} />
      <SectionBoundary label="the map" resetKey={frameId}>
        <FrameMapView frame={frame.data} />
      </SectionBoundary>
    </>
  );
}
