import type { UserDto } from "@shared/api/auth.ts";
import { Button } from "@/components/ui/button.tsx";
import { Dialog } from "@/components/ui/dialog.tsx";
import { Notice } from "@/components/ui/notice.tsx";
import { useToast } from "@/components/ui/toaster.tsx";
import { describeError, describeErrorLine } from "@/lib/describe-error.ts";
import { useUpdateUser } from "../api/update-user.ts";

/** Confirms disabling or re-enabling an account. Disabled accounts cannot sign in; nothing is deleted. */
export function AccountStatusDialog({ user, onClose }: { user: UserDto; onClose: () => void }) {
  const updateUser = useUpdateUser();
  const toast = useToast();
  const disabling = !user.disabled;

  const confirm = () =>
    updateUser.mutate(
      { id: user.id, changes: { disabled: disabling } },
      {
        onSuccess: (updated) => {
          toast.success(disabling ? "Account disabled" : "Account enabled", `${updated.displayName} · ${updated.username}`);
          onClose();
        },
        onError: (error) => toast.error(disabling ? "Account not disabled" : "Account not enabled", describeErrorLine(error)),
      },
    );

  return (
    <Dialog
      open
      onClose={onClose}
      width="sm"
      title={disabling ? `Disable ${user.username}?` : `Enable ${user.username}?`}
      description={
        disabling
          ? `${user.displayName} will no longer be able to sign in. Their history stays in the audit trail, and the account can be enabled again.`
          : `${user.displayName} will be able to sign in again with their current password.`
      }
    >
      {updateUser.isError && (
        <div className="mb-3">
          <Notice tone="danger">{describeError(updateUser.error).message}</Notice>
        </div>
      )}
      <div className="flex justify-end gap-2">
        <Button onClick={onClose}>Cancel</Button>
        <Button variant={disabling ? "danger" : "primary"} onClick={confirm} disabled={updateUser.isPending}>
          {disabling ? "Disable account" : "Enable account"}
        </Button>
      </div>
    </Dialog>
  );
}
