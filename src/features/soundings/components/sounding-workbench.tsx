import { useEffect, useRef, useState } from "react";
import type { SoundingReportDto } from "@shared/api/soundings.ts";
import { DEMO_SOUNDINGS } from "@shared/demo/soundings.ts";
import { Loading } from "@/components/ui/loading.tsx";
import { useSoundingReport, type SoundingSubmission } from "../api/report-sounding.ts";
import { soundingProblem } from "../sounding-error.ts";
import { SoundingResults } from "./sounding-results.tsx";
import { SoundingSourcePanel } from "./sounding-source-panel.tsx";

interface Shown {
  report: SoundingReportDto;
  submission: SoundingSubmission;
}

function titleOf(submission: SoundingSubmission): string {
  if (submission.origin === "file") return `File: ${submission.label}`;
  if (submission.origin === "paste") return "Pasted sounding";
  return submission.label;
}

/**
 * A sounding the user brings: a demo, a file or pasted text. The last good result stays on screen while a new
 * one computes or fails, and the first demo is shown on arrival so the page is never empty.
 */
export function SoundingWorkbench() {
  const mutation = useSoundingReport();
  const [shown, setShown] = useState<Shown | null>(null);
  const started = useRef(false);

  const submit = (submission: SoundingSubmission) => {
    mutation.mutate(submission, { onSuccess: (report) => setShown({ report, submission }) });
  };

  useEffect(() => {
    // Once per visit, even under StrictMode's double effects.
    if (started.current) return;
    started.current = true;
    const demo = DEMO_SOUNDINGS[0];
    submit({ csv: demo.csv, label: demo.title, origin: "demo" });
  }, []);

  const failed = mutation.isError ? mutation.variables : null;
  const problem = failed ? { ...soundingProblem(mutation.error), label: failed.origin === "paste" ? "the pasted text" : failed.label } : null;

  return (
    <>
      <SoundingSourcePanel onSubmit={submit} pending={mutation.isPending} problem={problem} problemOrigin={failed?.origin ?? null} />
      {mutation.isPending && <Loading label="Computing the sounding…" />}
      {shown && (
        <SoundingResults
          report={shown.report}
          title={titleOf(shown.submission)}
          note={
            shown.submission.origin === "demo"
              ? "Invented sounding for the demo; not an observation."
              : "Computed by the server with the same library as the CLI (npm run cli -- diagnose)."
          }
        />
      )}
    </>
  );
}
