import { SectionBoundary } from "@/components/errors/section-boundary.tsx";
import { Loading } from "@/components/ui/loading.tsx";
import { Notice } from "@/components/ui/notice.tsx";
import { PageHeader } from "@/components/ui/page-header.tsx";
import { Panel } from "@/components/ui/panel.tsx";
import { describeError } from "@/lib/describe-error.ts";
import { formatCount } from "@/lib/format-units.ts";
import { isJobRunning, useIngestJobs } from "../api/get-ingest-jobs.ts";
import { useRuns } from "../api/get-runs.ts";
import { useGridLiveUpdates } from "../hooks/use-grid-live-updates.ts";
import { IngestJobsTable } from "./ingest-jobs-table.tsx";
import { LiveStatus } from "./live-status.tsx";
import { RunsList } from "./runs-list.tsx";
import { UploadDropZone } from "./upload-drop-zone.tsx";

function InboxExplanation({ canUpload }: { canUpload: boolean }) {
  return (
    <Notice title="No model files yet">
      <p>
        Bellwether takes GRIB2 and NetCDF model output from its <strong className="text-ink">inbox folder</strong> on the server: the folder named by the{" "}
        <code className="font-mono">INBOX_DIR</code> setting, by default <code className="font-mono">inbox</code> inside the data folder. It looks every{" "}
        <code className="font-mono">INBOX_POLL_SECONDS</code> seconds (15 unless set) and takes a file once its size has stopped changing, so files still
        being copied are left alone. {canUpload ? "You can also upload files above." : "Leads, forecasters and administrators can also upload files here."}
      </p>
      <p className="mt-1">Each file becomes an ingest job; its frames appear here when the diagnostics are done.</p>
    </Notice>
  );
}

/** Model files as they arrive, their ingest progress, and the runs and frames they became. */
export function GridsPage({ canUpload }: { canUpload: boolean }) {
  useGridLiveUpdates();
  const jobs = useIngestJobs();
  const runs = useRuns();
  const running = jobs.data?.filter(isJobRunning).length ?? 0;
  const empty = jobs.data?.length === 0 && runs.data?.length === 0;

  return (
    <>
      <PageHeader
        title="Grids"
        description="Model files as they arrive, their decoding and diagnostics, and the runs and frames they became. Open a frame to see any field on the map."
        actions={<LiveStatus />}
      />
      <div className="flex flex-col gap-4">
        {canUpload && <UploadDropZone />}
        {empty && <InboxExplanation canUpload={canUpload} />}
        <div className="grid gap-4 2xl:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
          <Panel title="Ingest jobs" actions={<span className="text-xs text-muted">{running > 0 ? `${formatCount(running, "job")} running` : "Newest first"}</span>}>
            <SectionBoundary label="the ingest jobs">
              {jobs.isPending && <Loading label="Loading ingest jobs…" />}
              {jobs.isError && (
                <Notice tone="danger" title="Could not load the ingest jobs">
                  {describeError(jobs.error).message}
                </Notice>
              )}
              {jobs.data && (jobs.data.length > 0 ? <IngestJobsTable jobs={jobs.data} /> : <p className="text-muted">No files received yet.</p>)}
            </SectionBoundary>
          </Panel>
          <Panel title="Model runs" actions={<span className="text-xs text-muted">Newest run first</span>}>
            <SectionBoundary label="the model runs">
              {runs.isPending && <Loading label="Loading model runs…" />}
              {runs.isError && (
                <Notice tone="danger" title="Could not load the model runs">
                  {describeError(runs.error).message}
                </Notice>
              )}
              {runs.data && (runs.data.length > 0 ? <RunsList runs={runs.data} /> : <p className="text-muted">No frames stored yet.</p>)}
            </SectionBoundary>
          </Panel>
        </div>
      </div>
    </>
  );
}
