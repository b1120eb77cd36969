import { useId } from "react";
import { STORM_REPORT_CSV_HEADER } from "@shared/storm-reports/storm-report-csv.ts";
import { Notice } from "@/components/ui/notice.tsx";
import { Panel } from "@/components/ui/panel.tsx";
import { describeError } from "@/lib/describe-error.ts";
import { formatCount } from "@/lib/format-units.ts";
import { useUploadStormReports } from "../api/storm-reports.ts";

/** Upload of observed reports as Bellwether's CSV; the reply lists refused rows (line and reason) and duplicates. */
export function StormReportUpload() {
  const inputId = useId();
  const upload = useUploadStormReports();
  const result = upload.data;
  return (
    <Panel title="Load storm reports">
      <div className="flex flex-col gap-3">
        <p className="text-muted">
          A CSV file with the header <code className="font-mono text-xs text-ink">{STORM_REPORT_CSV_HEADER}</code>: time in UTC (ISO 8601), decimal degrees, kind
          tornado, hail or wind, magnitude in EF (tornado), in or mm (hail diameter), kt, m/s or mph (wind gust), or both left empty. Good rows are stored; each bad
          row is listed with its line; a report already known (same kind, within 10 minutes and 3 km) is recognised and not stored twice.
        </p>
        <div className="flex items-center gap-3">
          <label htmlFor={inputId} className="text-xs font-medium text-muted">
            Storm-report CSV
          </label>
          <input
            id={inputId}
            type="file"
            accept=".csv,text/csv"
            data-testid="storm-report-file"
            disabled={upload.isPending}
            onChange={(event) => {
              const file = event.target.files?.[0];
              if (file) upload.mutate(file);
              event.target.value = "";
            }}
          />
          {upload.isPending && <span className="text-muted">Checking the file…</span>}
        </div>
        {upload.isError && (
          <Notice tone="danger" title="The file was refused">
            {describeError(upload.error).message}
          </Notice>
        )}
        {result && (
          <div role="status" aria-live="polite" className="flex flex-col gap-2" data-testid="upload-result">
            <Notice tone={result.refused.length ? "caution" : "ok"} title={`${result.fileName}: ${formatCount(result.stored.length, "report")} stored`}>
              {result.rows} rows read · {formatCount(result.duplicates.length, "duplicate")} recognised · {formatCount(result.refused.length, "row")} refused
            </Notice>
            {result.refused.length > 0 && (
              <table className="text-left text-xs" aria-label="Refused rows">
                <thead className="text-muted">
                  <tr>
                    <th scope="col" className="pr-3 font-medium">
                      Line
                    </th>
                    <th scope="col" className="font-medium">
                      Why it was refused
                    </th>
                  </tr>
                </thead>
                <tbody>
                  {result.refused.map((r) => (
                    <tr key={r.line}>
                      <td className="pr-3 font-mono tabular-nums">{r.line}</td>
                      <td>{r.reason}</td>
                    </tr>
                  ))}
                </tbody>
              </table>
            )}
            {result.duplicates.length > 0 && (
              <p className="text-xs text-muted">
                Duplicates:{" "}
                {result.duplicates
                  .map((d) => `line ${d.line} repeats ${d.duplicateOfReportId !== null ? `stored report #${d.duplicateOfReportId}` : `line ${d.duplicateOfLine}`}`)
                  .join("; ")}
              </p>
            )}
          </div>
        )}
      </div>
    </Panel>
  );
}
