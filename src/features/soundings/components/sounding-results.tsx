import { useState, type ReactNode } from "react";
import type { SoundingReportDto } from "@shared/api/soundings.ts";
import { SectionBoundary } from "@/components/errors/section-boundary.tsx";
import { Panel } from "@/components/ui/panel.tsx";
import { useParcelShortcut } from "../hooks/use-parcel-shortcut.ts";
import { DEFAULT_SHADED_PARCEL, nextParcel, type ParcelId } from "../parcels.ts";
import { HodographLegend, SkewTLegend } from "./chart-legends.tsx";
import { FieldTables } from "./field-table.tsx";
import { Hodograph } from "./hodograph.tsx";
import { ParcelToggle } from "./parcel-toggle.tsx";
import { SkewTDiagram } from "./skew-t-diagram.tsx";

/**
 * The three views of one sounding report: skew-T (with the shaded-parcel toggle), hodograph and the table of
 * every column field. `title` names what is shown (a demo, a file, a model column); each view fails on its own.
 */
export function SoundingResults({ report, title, note }: { report: SoundingReportDto; title: ReactNode; note?: ReactNode }) {
  const [shaded, setShaded] = useState<ParcelId>(DEFAULT_SHADED_PARCEL);
  useParcelShortcut(() => setShaded(nextParcel));

  return (
    <section aria-label="Sounding results" className="mt-4 flex flex-col gap-4">
      <div className="flex flex-wrap items-center justify-between gap-3">
        <div>
          <h2 className="text-base font-semibold" data-testid="result-title">
            {title}
          </h2>
          {note && <p className="text-xs text-muted">{note}</p>}
        </div>
        <ParcelToggle value={shaded} onChange={setShaded} />
      </div>
      <div className="grid items-start gap-4 xl:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
        <Panel title="Skew-T log-p">
          <SectionBoundary label="the skew-T diagram" resetKey={report}>
            <SkewTDiagram report={report} shaded={shaded} />
            <SkewTLegend shaded={shaded} virtual={report.meta.options.virtualCorrection} />
          </SectionBoundary>
        </Panel>
        <Panel title="Hodograph">
          <SectionBoundary label="the hodograph" resetKey={report}>
            <div className="mx-auto max-w-[460px]">
              <Hodograph report={report} />
            </div>
            <HodographLegend report={report} />
          </SectionBoundary>
        </Panel>
      </div>
      <Panel title="Column fields">
        <SectionBoundary label="the field table" resetKey={report}>
          <FieldTables fields={report.fields} />
          <p className="mt-3 text-xs text-muted">Hover a row for what the field means. "—" marks a value that is undefined for this profile (for example no LFC).</p>
        </SectionBoundary>
      </Panel>
    </section>
  );
}
