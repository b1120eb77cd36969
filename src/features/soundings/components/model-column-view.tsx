import { Link } from "react-router-dom";
import { columnLinkQuery } from "@shared/api/soundings.ts";
import { SectionBoundary } from "@/components/errors/section-boundary.tsx";
import { Loading } from "@/components/ui/loading.tsx";
import { Notice } from "@/components/ui/notice.tsx";
import { paths } from "@/config/paths.ts";
import { describeError } from "@/lib/describe-error.ts";
import { useModelColumn } from "../api/get-model-column.ts";
import { ColumnHeader, formatLatLon } from "./column-header.tsx";
import { SoundingResults } from "./sounding-results.tsx";

const backLink = (
  <Link to={paths.soundings} className="text-accent underline-offset-2 hover:underline">
    Open a sounding file instead
  </Link>
);

/** `?frame=&lat=&lon=`: checks the link, then shows the model column nearest that point. */
export function ModelColumnView({ searchParams }: { searchParams: URLSearchParams }) {
  const parsed = columnLinkQuery.safeParse({
    frame: searchParams.get("frame") ?? undefined,
    lat: searchParams.get("lat") ?? undefined,
    lon: searchParams.get("lon") ?? undefined,
  });
  if (!parsed.success) {
    const problems = parsed.error.issues.map((issue) => `${issue.path.join(".") || "link"}: ${issue.message}`);
    return (
      <Notice tone="danger" title="This sounding link is not complete">
        <p>A model column needs frame, lat and lon in the address. {problems.join("; ")}.</p>
        <p className="mt-1">{backLink}</p>
      </Notice>
    );
  }
  const { frame, lat, lon } = parsed.data;
  return <ModelColumn key={`${frame}:${lat}:${lon}`} frameId={frame} lat={lat} lon={lon} />;
}

function ModelColumn({ frameId, lat, lon }: { frameId: number; lat: number; lon: number }) {
  const column = useModelColumn(frameId, lat, lon);
  if (column.isPending) return <Loading label={`Reading the model column at ${formatLatLon(lat, lon)}…`} />;
  if (column.isError) {
    return (
      <Notice tone="danger" title={`Could not read the column of frame ${frameId} at ${formatLatLon(lat, lon)}`}>
        <p>{describeError(column.error).message}</p>
        <p className="mt-1">{backLink}</p>
      </Notice>
    );
  }
  const { frame } = column.data;
  return (
    <>
      <SectionBoundary label="the column header">
        <ColumnHeader column={column.data} requested={{ lat, lon }} />
      </SectionBoundary>
      <SoundingResults
        report={column.data.report}
        title={`${frame.model} column, forecast hour ${frame.forecastHour}`}
        note={<>The stored frame's levels at the grid point nearest the map point. {backLink}</>}
      />
    </>
  );
}
