import { useState } from "react";
import { Controller, useForm } from "react-hook-form";
import { useQuery } from "@tanstack/react-query";
import { z } from "zod";
import { CHANNEL_LABELS, CHANNELS, type ContactDto } from "@shared/api/notifications.ts";
import { userDto } from "@shared/api/auth.ts";
import { Dialog } from "@/components/ui/dialog.tsx";
import { FormFooter } from "@/components/ui/form-footer.tsx";
import { SelectField } from "@/components/ui/select-field.tsx";
import { TextField } from "@/components/ui/text-field.tsx";
import { useToast } from "@/components/ui/toaster.tsx";
import { api } from "@/lib/api-client.ts";
import { describeErrorLine } from "@/lib/describe-error.ts";
import { fieldErrorsFromApiError } from "@/lib/form-errors.ts";
import { useSaveContact } from "../api/contacts.ts";
import { contactFormValues, contactResolver } from "../contact-form.ts";

const FIELDS = ["name", "organisation", "email", "mobile", "channels", "userId"] as const;

/** Accounts a contact can be linked to (only administrators may list accounts). */
function useAccountOptions(enabled: boolean) {
  return useQuery({
    queryKey: ["notify", "account-options"],
    queryFn: async ({ signal }) => (await api.get("/api/users", { schema: z.object({ users: z.array(userDto) }), signal })).users,
    enabled,
  });
}

/** Create or edit one contact: addresses, preferred channels, quiet hours, linked account. */
export function ContactDialog({ contact, officeTimeZone, canLinkAccounts, onClose }: { contact: ContactDto | null; officeTimeZone: string; canLinkAccounts: boolean; onClose: () => void }) {
  const save = useSaveContact();
  const toast = useToast();
  const accounts = useAccountOptions(canLinkAccounts);
  const form = useForm({ resolver: contactResolver, defaultValues: contactFormValues(contact, officeTimeZone) });
  const { errors } = form.formState;
  const [generalError, setGeneralError] = useState<unknown>(null);
  const quietEnabled = form.watch("quietEnabled");

  const submit = form.handleSubmit((input) => {
    setGeneralError(null);
    save.mutate(
      { id: contact?.id ?? null, input },
      {
        onSuccess: (saved) => {
          toast.success(contact ? "Contact saved" : "Contact added", saved.name);
          onClose();
        },
        onError: (error) => {
          toast.error("Contact not saved", describeErrorLine(error));
          const fieldErrors = fieldErrorsFromApiError(error);
          let placed = false;
          for (const field of FIELDS) {
            if (!fieldErrors[field]) continue;
            form.setError(field, { message: fieldErrors[field] });
            placed = true;
          }
          if (!placed) setGeneralError(error);
        },
      },
    );
  });

  return (
    <Dialog open onClose={onClose} title={contact ? `Edit ${contact.name}` : "New contact"} description="Who Bellwether can notify, and how." width="lg">
      <form onSubmit={submit} noValidate className="grid grid-cols-1 gap-3 sm:grid-cols-2">
        <TextField label="Name" autoComplete="off" error={errors.name?.message} {...form.register("name")} />
        <TextField label="Organisation" autoComplete="off" hint="Empty for office staff; the partner's organisation otherwise." error={errors.organisation?.message} {...form.register("organisation")} />
        <TextField label="E-mail" type="email" autoComplete="off" error={errors.email?.message} {...form.register("email")} />
        <TextField label="Mobile (E.164)" mono autoComplete="off" placeholder="+15550100123" error={errors.mobile?.message} {...form.register("mobile")} />
        <Controller
          control={form.control}
          name="channels"
          render={({ field, fieldState }) => (
            <fieldset className="flex flex-col gap-1">
              <legend className="mb-1 text-xs font-medium text-muted">Preferred channels</legend>
              {CHANNELS.map((channel) => (
                <label key={channel} className="flex items-center gap-2">
                  <input
                    type="checkbox"
                    checked={field.value.includes(channel)}
                    onChange={() => field.onChange(field.value.includes(channel) ? field.value.filter((c) => c !== channel) : [...field.value, channel])}
                  />
                  {CHANNEL_LABELS[channel]}
                </label>
              ))}
              {fieldState.error && <p className="text-xs text-danger">{fieldState.error.message}</p>}
            </fieldset>
          )}
        />
        <div className="flex flex-col gap-2">
          <label className="flex items-center gap-2 text-sm">
            <input type="checkbox" {...form.register("quietEnabled")} />
            Quiet hours (heads-up messages wait for a digest)
          </label>
          {quietEnabled && (
            <div className="grid grid-cols-3 gap-2">
              <TextField label="From" mono placeholder="22:00" error={errors.quietHours?.start?.message} {...form.register("quietHours.start")} />
              <TextField label="To" mono placeholder="06:00" error={errors.quietHours?.end?.message} {...form.register("quietHours.end")} />
              <TextField label="Time zone" mono error={errors.quietHours?.timeZone?.message} {...form.register("quietHours.timeZone")} />
            </div>
          )}
        </div>
        {canLinkAccounts ? (
          <SelectField label="Linked account" error={errors.userId?.message} {...form.register("userId")}>
            <option value="">No account (e.g. a partner)</option>
            {(accounts.data ?? []).map((u) => (
              <option key={u.id} value={String(u.id)}>
                {u.displayName} ({u.username})
              </option>
            ))}
          </SelectField>
        ) : (
          <p className="self-end text-xs text-muted">Linked account: {contact?.username ?? "none"} (administrators change this).</p>
        )}
        <label className="flex items-center gap-2 self-end text-sm">
          <input type="checkbox" {...form.register("active")} />
          Active (inactive contacts receive nothing)
        </label>
        <div className="sm:col-span-2">
          <FormFooter error={generalError} pending={save.isPending} submitLabel={contact ? "Save contact" : "Add contact"} pendingLabel="Saving…" onCancel={onClose} />
        </div>
      </form>
    </Dialog>
  );
}
