import { useState } from "react";
import { Controller, useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { groupInput, type ContactDto, type GroupDto } from "@shared/api/notifications.ts";
import { Dialog } from "@/components/ui/dialog.tsx";
import { FormFooter } from "@/components/ui/form-footer.tsx";
import { TextField } from "@/components/ui/text-field.tsx";
import { useToast } from "@/components/ui/toaster.tsx";
import { describeErrorLine } from "@/lib/describe-error.ts";
import { fieldErrorsFromApiError } from "@/lib/form-errors.ts";
import { useSaveGroup } from "../api/contacts.ts";

/** Create or edit a contact group: its name, what it is for, and its members. */
export function GroupDialog({ group, contacts, onClose }: { group: GroupDto | null; contacts: readonly ContactDto[]; onClose: () => void }) {
  const save = useSaveGroup();
  const toast = useToast();
  const form = useForm({ resolver: zodResolver(groupInput), defaultValues: { name: group?.name ?? "", description: group?.description ?? "", contactIds: group?.contactIds ?? [] } });
  const { errors } = form.formState;
  const [generalError, setGeneralError] = useState<unknown>(null);

  const submit = form.handleSubmit((input) => {
    setGeneralError(null);
    save.mutate(
      { id: group?.id ?? null, input },
      {
        onSuccess: (saved) => {
          toast.success(group ? "Group saved" : "Group added", saved.name);
          onClose();
        },
        onError: (error) => {
          toast.error("Group not saved", describeErrorLine(error));
          const fieldErrors = fieldErrorsFromApiError(error);
          if (fieldErrors.name) form.setError("name", { message: fieldErrors.name });
          else setGeneralError(error);
        },
      },
    );
  });

  return (
    <Dialog open onClose={onClose} title={group ? `Edit ${group.name}` : "New group"} description="Rules can address every member of a group at once.">
      <form onSubmit={submit} noValidate className="flex flex-col gap-3">
        <TextField label="Name" autoComplete="off" error={errors.name?.message} {...form.register("name")} />
        <TextField label="Description" autoComplete="off" error={errors.description?.message} {...form.register("description")} />
        <Controller
          control={form.control}
          name="contactIds"
          render={({ field, fieldState }) => (
            <fieldset className="flex max-h-64 flex-col gap-1 overflow-y-auto">
              <legend className="mb-1 text-xs font-medium text-muted">Members</legend>
              {contacts.map((c) => {
                const ids = field.value ?? [];
                return (
                  <label key={c.id} className="flex items-center gap-2">
                    <input type="checkbox" checked={ids.includes(c.id)} onChange={() => field.onChange(ids.includes(c.id) ? ids.filter((id) => id !== c.id) : [...ids, c.id])} />
                    {c.name}
                    {c.organisation && <span className="text-xs text-muted">{c.organisation}</span>}
                  </label>
                );
              })}
              {fieldState.error && <p className="text-xs text-danger">{fieldState.error.message}</p>}
            </fieldset>
          )}
        />
        <FormFooter error={generalError} pending={save.isPending} submitLabel={group ? "Save group" : "Add group"} pendingLabel="Saving…" onCancel={onClose} />
      </form>
    </Dialog>
  );
}
