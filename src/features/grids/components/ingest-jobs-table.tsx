import type { IngestJobDto } from "@shared/api/grids.ts";
import { Chip } from "@/components/ui/chip.tsx";
import { ProgressBar } from "@/components/ui/progress-bar.tsx";
import { Timestamp } from "@/components/ui/timestamp.tsx";
import { formatCount } from "@/lib/format-units.ts";
import { isJobRunning } from "../api/get-ingest-jobs.ts";
import { formatFileSize } from "../format-grid-labels.ts";
import { JobStateChip } from "./job-state-chip.tsx";

const SOURCE_LABELS: Record<IngestJobDto["source"], string> = { upload: "uploaded", inbox: "inbox", demo: "demo" };

function JobOutcome({ job }: { job: IngestJobDto }) {
  if (isJobRunning(job)) {
    return (
      <div className="flex flex-col gap-1">
        <ProgressBar value={job.progress} label={`Ingest of ${job.originalName}`} />
        <p className="text-xs text-muted">{job.stageNote ?? "Waiting for its turn"}</p>
      </div>
    );
  }
  if (job.state === "failed") {
    return <p className="text-xs text-danger">{job.failureReason ?? "The job failed without a recorded reason."}</p>;
  }
  return <p className="text-xs text-muted">{formatCount(job.frameCount, "frame")} stored</p>;
}

function IgnoredFields({ fields }: { fields: readonly string[] }) {
  if (fields.length === 0) return null;
  return (
    <details className="mt-1 text-xs">
      <summary className="cursor-pointer text-muted hover:text-ink">{formatCount(fields.length, "field")} in the file not used</summary>
      <ul className="mt-1 list-disc pl-5 font-mono text-muted">
        {fields.map((name) => (
          <li key={name}>{name}</li>
        ))}
      </ul>
    </details>
  );
}

/** Recent ingest jobs, newest first, each with its state, live progress or outcome. */
export function IngestJobsTable({ jobs }: { jobs: readonly IngestJobDto[] }) {
  return (
    <div className="overflow-x-auto">
      <table className="w-full text-left text-sm">
        <thead className="border-b border-line bg-raised text-xs text-muted">
          <tr>
            <th scope="col" className="px-3 py-2 font-medium">File</th>
            <th scope="col" className="px-3 py-2 font-medium">State</th>
            <th scope="col" className="w-2/5 px-3 py-2 font-medium">Progress or outcome</th>
            <th scope="col" className="px-3 py-2 font-medium">Received</th>
          </tr>
        </thead>
        <tbody>
          {jobs.map((job) => (
            <tr key={job.id} data-job-id={job.id} className="border-b border-line align-top last:border-b-0">
              <td className="px-3 py-2">
                <p className="font-mono text-xs break-all">{job.originalName}</p>
                <p className="mt-0.5 flex flex-wrap items-center gap-1.5 text-xs text-muted">
                  <Chip>{SOURCE_LABELS[job.source]}</Chip>
                  <span>{job.format.toUpperCase()}</span>
                  <span>{formatFileSize(job.sizeBytes)}</span>
                  {job.submittedBy && <span>by {job.submittedBy}</span>}
                </p>
                <IgnoredFields fields={job.ignoredFields} />
              </td>
              <td className="px-3 py-2">
                <JobStateChip state={job.state} />
              </td>
              <td className="px-3 py-2">
                <JobOutcome job={job} />
              </td>
              <td className="px-3 py-2">
                <Timestamp value={job.createdAt} />
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
