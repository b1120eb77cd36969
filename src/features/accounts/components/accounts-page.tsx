import { useState } from "react";
import type { UserDto } from "@shared/api/auth.ts";
import { SectionBoundary } from "@/components/errors/section-boundary.tsx";
import { Button } from "@/components/ui/button.tsx";
import { Loading } from "@/components/ui/loading.tsx";
import { Notice } from "@/components/ui/notice.tsx";
import { PageHeader } from "@/components/ui/page-header.tsx";
import { describeError } from "@/lib/describe-error.ts";
import { formatCount } from "@/lib/format-units.ts";
import { useUsers } from "../api/get-users.ts";
import { AccountStatusDialog } from "./account-status-dialog.tsx";
import { AccountsTable, type AccountAction } from "./accounts-table.tsx";
import { CreateAccountDialog } from "./create-account-dialog.tsx";
import { EditAccountDialog } from "./edit-account-dialog.tsx";
import { ResetPasswordDialog } from "./reset-password-dialog.tsx";

type OpenDialog = { kind: "create" } | { kind: AccountAction; user: UserDto } | null;

export function AccountsPage({ currentUserId }: { currentUserId: number }) {
  const users = useUsers();
  const [dialog, setDialog] = useState<OpenDialog>(null);
  const close = () => setDialog(null);

  const summary = users.data
    ? `${formatCount(users.data.length, "account")}, ${formatCount(users.data.filter((u) => u.disabled).length, "disabled account")}.`
    : "Who can sign in to Bellwether, and with which roles.";

  return (
    <>
      <PageHeader
        title="Accounts"
        description={summary}
        actions={
          <Button variant="primary" onClick={() => setDialog({ kind: "create" })}>
            New account
          </Button>
        }
      />
      <SectionBoundary label="the accounts table">
        {users.isPending && <Loading label="Loading accounts…" />}
        {users.isError && (
          <Notice tone="danger" title="Could not load the accounts">
            {describeError(users.error).message}
          </Notice>
        )}
        {users.data && (
          <AccountsTable users={users.data} currentUserId={currentUserId} onAction={(kind, user) => setDialog({ kind, user })} />
        )}
      </SectionBoundary>

      <CreateAccountDialog open={dialog?.kind === "create"} onClose={close} />
      {dialog?.kind === "edit" && <EditAccountDialog key={dialog.user.id} user={dialog.user} isSelf={dialog.user.id === currentUserId} onClose={close} />}
      {dialog?.kind === "password" && <ResetPasswordDialog key={dialog.user.id} user={dialog.user} onClose={close} />}
      {dialog?.kind === "status" && <AccountStatusDialog key={dialog.user.id} user={dialog.user} onClose={close} />}
    </>
  );
}
