import { useState } from "react";
import { Controller, useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { createUserInput, type CreateUserInput } from "@shared/api/users.ts";
import { Dialog } from "@/components/ui/dialog.tsx";
import { FormFooter } from "@/components/ui/form-footer.tsx";
import { TextField } from "@/components/ui/text-field.tsx";
import { useToast } from "@/components/ui/toaster.tsx";
import { isApiError } from "@/lib/api-client.ts";
import { describeErrorLine } from "@/lib/describe-error.ts";
import { fieldErrorsFromApiError } from "@/lib/form-errors.ts";
import { useCreateUser } from "../api/create-user.ts";
import { RoleCheckboxes } from "./role-checkboxes.tsx";

const EMPTY: CreateUserInput = { username: "", displayName: "", password: "", roles: ["forecaster"] };
const FIELDS = ["username", "displayName", "password", "roles"] as const;

export function CreateAccountDialog({ open, onClose }: { open: boolean; onClose: () => void }) {
  const createUser = useCreateUser();
  const toast = useToast();
  const form = useForm({ resolver: zodResolver(createUserInput), defaultValues: EMPTY });
  const { errors } = form.formState;
  // A failure that no single field explains, shown above the buttons.
  const [generalError, setGeneralError] = useState<unknown>(null);

  const close = () => {
    form.reset(EMPTY);
    createUser.reset();
    setGeneralError(null);
    onClose();
  };

  const submit = form.handleSubmit((input) => {
    setGeneralError(null);
    createUser.mutate(input, {
      onSuccess: (user) => {
        toast.success("Account created", `${user.displayName} can now sign in as ${user.username}.`);
        close();
      },
      onError: (error) => {
        toast.error("Account not created", describeErrorLine(error));
        // Put the server's field messages (e.g. a username already in use) beside the fields.
        const fieldErrors = fieldErrorsFromApiError(error);
        if (isApiError(error) && error.status === 409 && !fieldErrors.username) fieldErrors.username = error.message;
        let placed = false;
        for (const field of FIELDS) {
          if (!fieldErrors[field]) continue;
          form.setError(field, { message: fieldErrors[field] });
          placed = true;
        }
        if (!placed) setGeneralError(error);
      },
    });
  });

  return (
    <Dialog open={open} onClose={close} title="New account" description="The person signs in with this username and password.">
      <form onSubmit={submit} noValidate className="flex flex-col gap-3">
        <TextField label="Username" mono autoComplete="off" spellCheck={false} error={errors.username?.message} {...form.register("username")} />
        <TextField label="Display name" autoComplete="off" error={errors.displayName?.message} {...form.register("displayName")} />
        <TextField
          label="Initial password"
          type="password"
          autoComplete="new-password"
          hint="At least 10 characters. Share it privately; they can be given a new one later."
          error={errors.password?.message}
          {...form.register("password")}
        />
        <Controller
          control={form.control}
          name="roles"
          render={({ field, fieldState }) => <RoleCheckboxes value={field.value} onChange={field.onChange} error={fieldState.error?.message} />}
        />
        <FormFooter error={generalError} pending={createUser.isPending} submitLabel="Create account" pendingLabel="Creating…" onCancel={close} />
      </form>
    </Dialog>
  );
}
