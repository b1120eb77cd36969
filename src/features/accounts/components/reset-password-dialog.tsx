import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { z } from "zod";
import type { UserDto } from "@shared/api/auth.ts";
import { resetPasswordInput } from "@shared/api/users.ts";
import { Dialog } from "@/components/ui/dialog.tsx";
import { FormFooter } from "@/components/ui/form-footer.tsx";
import { TextField } from "@/components/ui/text-field.tsx";
import { useToast } from "@/components/ui/toaster.tsx";
import { describeErrorLine } from "@/lib/describe-error.ts";
import { useResetPassword } from "../api/reset-password.ts";

// The server's password rule plus a second entry to catch typing slips.
const resetPasswordForm = resetPasswordInput
  .extend({ confirm: z.string() })
  .refine((v) => v.password === v.confirm, { message: "The two entries differ", path: ["confirm"] });

export function ResetPasswordDialog({ user, onClose }: { user: UserDto; onClose: () => void }) {
  const resetPassword = useResetPassword();
  const toast = useToast();
  const form = useForm({ resolver: zodResolver(resetPasswordForm), defaultValues: { password: "", confirm: "" } });
  const { errors } = form.formState;

  const submit = form.handleSubmit(({ password }) =>
    resetPassword.mutate(
      { id: user.id, input: { password } },
      {
        onSuccess: () => {
          toast.success("Password changed", `Give ${user.displayName} the new password privately.`);
          onClose();
        },
        onError: (error) => toast.error("Password not changed", describeErrorLine(error)),
      },
    ),
  );

  return (
    <Dialog open onClose={onClose} title={`New password for ${user.username}`} width="sm">
      <form onSubmit={submit} noValidate className="flex flex-col gap-3">
        <TextField
          label="New password"
          type="password"
          autoComplete="new-password"
          hint="At least 10 characters."
          error={errors.password?.message}
          {...form.register("password")}
        />
        <TextField label="Repeat the new password" type="password" autoComplete="new-password" error={errors.confirm?.message} {...form.register("confirm")} />
        <FormFooter error={resetPassword.error} pending={resetPassword.isPending} submitLabel="Set password" pendingLabel="Saving…" onCancel={onClose} />
      </form>
    </Dialog>
  );
}
