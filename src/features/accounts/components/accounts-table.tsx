import { createColumnHelper, tableFeatures, useTable } from "@tanstack/react-table";
import type { UserDto } from "@shared/api/auth.ts";
import { Button } from "@/components/ui/button.tsx";
import { Chip } from "@/components/ui/chip.tsx";
import { DataTableHead } from "@/components/ui/data-table-head.tsx";
import { RoleChips } from "@/components/ui/role-chips.tsx";
import { Timestamp } from "@/components/ui/timestamp.tsx";

export type AccountAction = "edit" | "status" | "password";

interface TableMeta {
  currentUserId: number;
  onAction: (action: AccountAction, user: UserDto) => void;
}

// Module scope: the table library wants features and columns to stay the same object between
// renders, so per-render values (who is signed in, the action handler) travel in the table meta.
const features = tableFeatures({ tableMeta: {} as TableMeta });
const column = createColumnHelper<typeof features, UserDto>();

const columns = column.columns([
    column.accessor("username", {
      header: "Username",
      cell: (info) => <span className="font-mono">{info.getValue()}</span>,
    }),
    column.accessor("displayName", {
      header: "Display name",
      cell: (info) => (
        <>
          {info.getValue()}
          {info.row.original.id === info.table.options.meta?.currentUserId && <span className="ml-1.5 text-xs text-muted">(you)</span>}
        </>
      ),
    }),
    column.accessor("roles", { header: "Roles", cell: (info) => <RoleChips roles={info.getValue()} /> }),
    column.accessor("disabled", {
      header: "Status",
      cell: (info) => (info.getValue() ? <Chip tone="danger">Disabled</Chip> : <Chip tone="ok">Active</Chip>),
    }),
    column.accessor("lastLoginAt", {
      header: "Last sign-in",
      cell: (info) => <Timestamp value={info.getValue()} empty="Never" />,
    }),
    column.display({
      id: "actions",
      header: () => <span className="sr-only">Actions</span>,
      cell: ({ row, table }) => {
        const { currentUserId, onAction } = table.options.meta!;
        const user = row.original;
        const isSelf = user.id === currentUserId;
        return (
          <div className="flex justify-end gap-1.5">
            <Button size="sm" variant="ghost" onClick={() => onAction("edit", user)} aria-label={`Edit ${user.username}`}>
              Edit
            </Button>
            <Button size="sm" variant="ghost" onClick={() => onAction("password", user)} aria-label={`Set a new password for ${user.username}`}>
              New password
            </Button>
            <Button
              size="sm"
              variant={user.disabled ? "ghost" : "danger"}
              onClick={() => onAction("status", user)}
              disabled={isSelf && !user.disabled}
              title={isSelf && !user.disabled ? "You cannot disable your own account" : undefined}
              aria-label={`${user.disabled ? "Enable" : "Disable"} ${user.username}`}
            >
              {user.disabled ? "Enable" : "Disable"}
            </Button>
          </div>
        );
      },
    }),
  ]);

export function AccountsTable({ users, currentUserId, onAction }: { users: UserDto[] } & TableMeta) {
  const table = useTable({
    features,
    columns,
    meta: { currentUserId, onAction },
    data: users,
    getRowId: (user) => String(user.id),
  });

  return (
    <div className="overflow-x-auto rounded-md border border-line bg-surface">
      <table className="w-full text-left">
        <caption className="sr-only">Accounts</caption>
        <DataTableHead table={table} />
        <tbody>
          {table.getRowModel().rows.map((row) => (
            <tr key={row.id} className={`border-b border-line last:border-0 ${row.original.disabled ? "text-muted" : ""}`}>
              {row.getAllCells().map((cell) => (
                <td key={cell.id} className="px-3 py-1.5 align-middle">
                  <table.FlexRender cell={cell} />
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
