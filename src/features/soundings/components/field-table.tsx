import { useMemo } from "react";
import type { ColumnFieldsDto } from "@shared/api/soundings.ts";
import { fieldGroups, type FieldGroup } from "../field-groups.ts";

/**
 * Every column field of the catalogue in display units, one small table per theme. Each row header is the
 * catalogue key (the name rules use), its one-line meaning is the row's tooltip, and "—" marks an undefined value.
 */
export function FieldTables({ fields }: { fields: ColumnFieldsDto }) {
  const groups = useMemo(() => fieldGroups(fields), [fields]);
  return (
    // Columns rather than a grid, so short themes fill in under long ones.
    <div className="gap-8 md:columns-2 2xl:columns-3" data-testid="field-tables">
      {groups.map((group) => (
        <div key={group.theme} className="mb-5 break-inside-avoid">
          <ThemeTable group={group} />
        </div>
      ))}
    </div>
  );
}

function ThemeTable({ group }: { group: FieldGroup }) {
  return (
    <table className="w-full text-sm" data-theme-group={group.theme}>
      <caption className="mb-1 text-left text-xs font-semibold tracking-wide text-muted uppercase">{group.label}</caption>
      <thead className="border-b border-line text-xs text-muted">
        <tr>
          <th scope="col" className="py-1 pr-2 text-left font-medium">
            Field
          </th>
          <th scope="col" className="py-1 text-right font-medium">
            Value
          </th>
          <th scope="col" className="py-1 pl-2 text-left font-medium">
            Unit
          </th>
        </tr>
      </thead>
      <tbody>
        {group.rows.map((row) => (
          <tr key={row.key} title={row.meaning} className="border-b border-line/70 last:border-0 hover:bg-raised">
            <th scope="row" className="py-1 pr-2 text-left font-mono text-xs font-normal [font-variant-ligatures:none]">
              {row.key}
            </th>
            <td className="py-1 text-right font-mono tabular-nums [font-variant-ligatures:none]" data-field={row.key}>
              {row.text}
            </td>
            <td className="w-20 py-1 pl-2 text-xs text-muted">{row.unit}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
