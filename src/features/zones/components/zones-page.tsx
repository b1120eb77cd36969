import { useState } from "react";
import type { ZoneDto } from "@shared/api/zones.ts";
import { SectionBoundary } from "@/components/errors/section-boundary.tsx";
import { Button } from "@/components/ui/button.tsx";
import { Loading } from "@/components/ui/loading.tsx";
import { Notice } from "@/components/ui/notice.tsx";
import { PageHeader } from "@/components/ui/page-header.tsx";
import { describeError } from "@/lib/describe-error.ts";
import { formatCount } from "@/lib/format-units.ts";
import { useZones } from "../api/get-zones.ts";
import { ZoneDrawPanel } from "./drawing/zone-draw-panel.tsx";
import { ArchiveZoneDialog } from "./archive-zone-dialog.tsx";
import { EditZoneDialog } from "./edit-zone-dialog.tsx";
import { ZoneImport } from "./zone-import.tsx";
import { ZonesTable, type ZoneAction } from "./zones-table.tsx";

type OpenDialog = { kind: ZoneAction; zone: ZoneDto } | null;

/**
 * The office's forecast zones: what each covers on every stored grid, with the ones that cover
 * nothing flagged. Leads import, draw, rename and archive; everyone else reads.
 */
export function ZonesPage({ canEdit }: { canEdit: boolean }) {
  const zones = useZones();
  const [dialog, setDialog] = useState<OpenDialog>(null);
  const [drawing, setDrawing] = useState(false);
  const close = () => setDialog(null);
  const empty = zones.data?.filter((z) => z.coversNothing) ?? [];

  const summary = zones.data
    ? `${formatCount(zones.data.length, "zone")}${empty.length ? `, ${formatCount(empty.length, "zone")} covering no point of a stored grid` : ""}.`
    : "The forecast zones rules are checked over.";

  return (
    <>
      <PageHeader
        title="Zones"
        description={summary}
        actions={
          canEdit && !drawing ? (
            <Button variant="primary" onClick={() => setDrawing(true)}>
              Draw a zone
            </Button>
          ) : undefined
        }
      />
      <div className="flex flex-col gap-4">
        {canEdit ? <ZoneImport /> : <p className="text-muted">Only leads change zones; this list is read-only for your roles.</p>}
        {canEdit && drawing && (
          <SectionBoundary label="the zone drawing map">
            <ZoneDrawPanel zones={zones.data ?? []} onDone={() => setDrawing(false)} />
          </SectionBoundary>
        )}
        {empty.length > 0 && (
          <Notice tone="caution" title="Some zones cover no grid point">
            {empty.map((z) => z.code).join(", ")}: no point of at least one stored grid falls inside. Rules using{" "}
            {empty.length === 1 ? "this zone" : "these zones"} can never fire on that grid.
          </Notice>
        )}
        <SectionBoundary label="the zones table">
          {zones.isPending && <Loading label="Loading zones…" />}
          {zones.isError && (
            <Notice tone="danger" title="Could not load the zones">
              {describeError(zones.error).message}
            </Notice>
          )}
          {zones.data && zones.data.length === 0 && <Notice title="No zones yet">Import a GeoJSON file or draw a zone on the map.</Notice>}
          {zones.data && zones.data.length > 0 && <ZonesTable zones={zones.data} canEdit={canEdit} onAction={(kind, zone) => setDialog({ kind, zone })} />}
        </SectionBoundary>
      </div>
      {dialog?.kind === "edit" && <EditZoneDialog key={dialog.zone.id} zone={dialog.zone} onClose={close} />}
      {dialog?.kind === "archive" && <ArchiveZoneDialog key={dialog.zone.id} zone={dialog.zone} onClose={close} />}
    </>
  );
}
