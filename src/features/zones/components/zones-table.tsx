import { createColumnHelper, tableFeatures, useTable } from "@tanstack/react-table";
import type { ZoneDto } from "@shared/api/zones.ts";
import { Button } from "@/components/ui/button.tsx";
import { Chip } from "@/components/ui/chip.tsx";
import { DataTable } from "@/components/ui/data-table.tsx";
import { Timestamp } from "@/components/ui/timestamp.tsx";
import { formatCount } from "@/lib/format-units.ts";

export type ZoneAction = "edit" | "archive";

interface TableMeta {
  canEdit: boolean;
  onAction: (action: ZoneAction, zone: ZoneDto) => void;
}

const KIND_LABELS: Record<string, string> = { latlon: "Lat/lon", lambert: "Lambert", polar: "Polar stereographic" };

/** "Lambert 200 × 150" from a geometry key such as "lambert:200x150:R6371229.000:…". */
export function gridLabelFromKey(key: string): string {
  const [kind, size] = key.split(":");
  const [nx, ny] = (size ?? "").split("x");
  return `${KIND_LABELS[kind ?? ""] ?? kind} ${nx} × ${ny}`;
}

function CoverageCell({ zone }: { zone: ZoneDto }) {
  if (zone.coverage.length === 0) return <span className="text-muted">No stored grid yet</span>;
  return (
    <ul className="flex flex-col gap-0.5">
      {zone.coverage.map((c) => (
        <li key={c.geometryKey} className="font-mono text-xs tabular-nums">
          <span className="text-muted">{gridLabelFromKey(c.geometryKey)}:</span>{" "}
          <span className={c.points === 0 ? "text-danger" : ""}>{formatCount(c.points, "point")}</span>
        </li>
      ))}
    </ul>
  );
}

// Module scope: the table library wants features and columns to stay the same object between renders.
const features = tableFeatures({ tableMeta: {} as TableMeta });
const column = createColumnHelper<typeof features, ZoneDto>();

const columns = column.columns([
  column.accessor("code", { header: "Code", cell: (info) => <span className="font-mono font-medium">{info.getValue()}</span> }),
  column.accessor("name", { header: "Name" }),
  column.display({ id: "coverage", header: "Grid points covered", cell: ({ row }) => <CoverageCell zone={row.original} /> }),
  column.accessor("coversNothing", {
    header: "Status",
    cell: (info) =>
      info.getValue() ? (
        <Chip tone="danger">Covers no grid point</Chip>
      ) : (
        // Only the problem is coloured; a zone that is fine stays quiet.
        <span className="text-xs text-muted">{info.row.original.coverage.length === 0 ? "Not checked yet" : "Covers points"}</span>
      ),
  }),
  column.accessor("updatedAt", { header: "Shape changed", cell: (info) => <Timestamp value={info.getValue()} /> }),
  column.display({
    id: "actions",
    header: () => <span className="sr-only">Actions</span>,
    cell: ({ row, table }) => {
      const { canEdit, onAction } = table.options.meta!;
      if (!canEdit) return null;
      const zone = row.original;
      return (
        <div className="flex justify-end gap-1.5">
          <Button size="sm" variant="ghost" onClick={() => onAction("edit", zone)} aria-label={`Edit zone ${zone.code}`}>
            Edit
          </Button>
          <Button size="sm" variant="danger" onClick={() => onAction("archive", zone)} aria-label={`Archive zone ${zone.code}`}>
            Archive
          </Button>
        </div>
      );
    },
  }),
]);

export function ZonesTable({ zones, canEdit, onAction }: { zones: ZoneDto[] } & TableMeta) {
  const table = useTable({ features, columns, meta: { canEdit, onAction }, data: zones, getRowId: (zone) => String(zone.id) });
  return <DataTable table={table} caption="Forecast zones" rowClassName={(zone) => (zone.coversNothing ? "bg-danger/5" : "")} />;
}
