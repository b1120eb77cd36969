import { Controller, useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import type { UserDto } from "@shared/api/auth.ts";
import { createUserInput, type UpdateUserInput } from "@shared/api/users.ts";
import { Dialog } from "@/components/ui/dialog.tsx";
import { FormFooter } from "@/components/ui/form-footer.tsx";
import { TextField } from "@/components/ui/text-field.tsx";
import { useToast } from "@/components/ui/toaster.tsx";
import { describeErrorLine } from "@/lib/describe-error.ts";
import { useUpdateUser } from "../api/update-user.ts";
import { RoleCheckboxes } from "./role-checkboxes.tsx";

// The same rules as account creation, for the two fields this dialog edits.
const editAccountForm = createUserInput.pick({ displayName: true, roles: true });

/** Only what changed is sent, so the audit trail records the real edit. */
function changesFrom(user: UserDto, next: { displayName: string; roles: UserDto["roles"] }): UpdateUserInput {
  const changes: UpdateUserInput = {};
  if (next.displayName !== user.displayName) changes.displayName = next.displayName;
  if (next.roles.join(",") !== user.roles.join(",")) changes.roles = next.roles;
  return changes;
}

export function EditAccountDialog({ user, isSelf, onClose }: { user: UserDto; isSelf: boolean; onClose: () => void }) {
  const updateUser = useUpdateUser();
  const toast = useToast();
  const form = useForm({
    resolver: zodResolver(editAccountForm),
    defaultValues: { displayName: user.displayName, roles: user.roles },
  });
  const { errors } = form.formState;
  // The server refuses to let an administrator remove their own admin role; say so up front.
  const lockedRoles = isSelf && user.roles.includes("admin") ? (["admin"] as const) : [];

  const submit = form.handleSubmit((values) => {
    const changes = changesFrom(user, values);
    if (Object.keys(changes).length === 0) {
      onClose();
      return;
    }
    updateUser.mutate(
      { id: user.id, changes },
      {
        onSuccess: (updated) => {
          toast.success("Account updated", `${updated.displayName} · ${updated.username}`);
          onClose();
        },
        onError: (error) => toast.error("Account not updated", describeErrorLine(error)),
      },
    );
  });

  return (
    <Dialog open onClose={onClose} title={`Edit ${user.username}`} description="Change the display name or the roles.">
      <form onSubmit={submit} noValidate className="flex flex-col gap-3">
        <TextField label="Display name" autoComplete="off" error={errors.displayName?.message} {...form.register("displayName")} />
        <Controller
          control={form.control}
          name="roles"
          render={({ field, fieldState }) => (
            <RoleCheckboxes value={field.value} onChange={field.onChange} error={fieldState.error?.message} disabledRoles={lockedRoles} />
          )}
        />
        {lockedRoles.length > 0 && <p className="text-xs text-muted">You cannot remove your own administrator role.</p>}
        <FormFooter error={updateUser.error} pending={updateUser.isPending} submitLabel="Save changes" pendingLabel="Saving…" onCancel={onClose} />
      </form>
    </Dialog>
  );
}
