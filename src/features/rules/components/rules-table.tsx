import { Link } from "react-router-dom";
import { createColumnHelper, tableFeatures, useTable } from "@tanstack/react-table";
import type { RuleDto } from "@shared/api/rules.ts";
import { rulePaths } from "@/config/paths.ts";
import { Chip } from "@/components/ui/chip.tsx";
import { DataTable } from "@/components/ui/data-table.tsx";
import { SeverityChip } from "@/components/ui/severity-chip.tsx";
import { Timestamp } from "@/components/ui/timestamp.tsx";
import type { ZoneOption } from "../editor/rule-editor-types.ts";
import { RuleEnabledSwitch } from "./rule-enabled-switch.tsx";

interface TableMeta {
  canEdit: boolean;
  zoneById: ReadonlyMap<number, ZoneOption>;
}

const features = tableFeatures({ tableMeta: {} as TableMeta });
const column = createColumnHelper<typeof features, RuleDto>();

const columns = column.columns([
  column.accessor("name", {
    header: "Rule",
    cell: ({ row }) => (
      <div className="flex max-w-md flex-col">
        <Link to={rulePaths.detail(row.original.id)} className="font-medium text-accent hover:underline">
          {row.original.name}
        </Link>
        <span className="truncate font-mono text-xs text-muted" title={row.original.current.definition.expression}>
          {row.original.current.definition.expression}
        </span>
      </div>
    ),
  }),
  column.display({ id: "severity", header: "Severity", cell: ({ row }) => <SeverityChip severity={row.original.current.definition.severity} /> }),
  column.display({ id: "enabled", header: "Switched", cell: ({ row, table }) => <RuleEnabledSwitch rule={row.original} canEdit={table.options.meta!.canEdit} /> }),
  column.display({
    id: "zones",
    header: "Zones",
    cell: ({ row, table }) => {
      const { zoneById } = table.options.meta!;
      const { zoneIds } = row.original.current.definition;
      const empty = row.original.emptyZoneIds.map((id) => zoneById.get(id)?.code ?? `#${id}`);
      return (
        <div className="flex flex-col gap-0.5">
          <span className="font-mono text-xs">{zoneIds.map((id) => zoneById.get(id)?.code ?? `#${id}`).join(" ")}</span>
          {empty.length > 0 && (
            <Chip tone="caution" className="self-start">
              {empty.join(", ")} cover{empty.length === 1 ? "s" : ""} no grid point
            </Chip>
          )}
        </div>
      );
    },
  }),
  column.display({
    id: "version",
    header: "Version",
    cell: ({ row }) => (
      <Link to={rulePaths.history(row.original.id)} className="font-mono text-xs text-accent hover:underline" aria-label={`History of ${row.original.name}`}>
        v{row.original.current.version}
      </Link>
    ),
  }),
  column.display({
    id: "changed",
    header: "Last changed",
    cell: ({ row }) => (
      <div className="flex flex-col">
        <Timestamp value={row.original.current.createdAt} />
        <span className="text-xs text-muted">by {row.original.current.createdBy ?? "the system"}</span>
      </div>
    ),
  }),
]);

export function RulesTable({ rules, canEdit, zones }: { rules: RuleDto[]; canEdit: boolean; zones: readonly ZoneOption[] }) {
  const zoneById = new Map(zones.map((z) => [z.id, z]));
  const table = useTable({ features, columns, meta: { canEdit, zoneById }, data: rules, getRowId: (rule) => String(rule.id) });
  return <DataTable table={table} caption="Rules" rowClassName={(rule) => (rule.enabled ? "" : "text-muted")} />;
}
