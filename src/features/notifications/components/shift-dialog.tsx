import { useState, type FormEvent } from "react";
import { SHIFT_ROLES, shiftInput, type ContactDto, type ShiftDto, type ShiftRole } from "@shared/api/notifications.ts";
import { Dialog } from "@/components/ui/dialog.tsx";
import { FormFooter } from "@/components/ui/form-footer.tsx";
import { SelectField } from "@/components/ui/select-field.tsx";
import { TextField } from "@/components/ui/text-field.tsx";
import { useToast } from "@/components/ui/toaster.tsx";
import { describeErrorLine } from "@/lib/describe-error.ts";
import { fieldErrorsFromApiError } from "@/lib/form-errors.ts";
import { isoToUtcInput, utcInputToIso } from "@/lib/time.ts";
import { useSaveShift } from "../api/on-call.ts";

const ROLE_LABELS: Record<ShiftRole, string> = { forecaster: "Forecaster", lead: "Lead (first escalation level)" };

/** Add or change one shift. Times are typed in UTC, as the schedule is kept. */
export function ShiftDialog({ shift, contacts, defaultStart, onClose }: { shift: ShiftDto | null; contacts: readonly ContactDto[]; defaultStart: Date; onClose: () => void }) {
  const save = useSaveShift();
  const toast = useToast();
  const [contactId, setContactId] = useState(String(shift?.contactId ?? contacts.find((c) => c.active)?.id ?? ""));
  const [role, setRole] = useState<ShiftRole>(shift?.role ?? "forecaster");
  const [startsAt, setStartsAt] = useState(isoToUtcInput(shift?.startsAt ?? defaultStart.toISOString()));
  const [endsAt, setEndsAt] = useState(isoToUtcInput(shift?.endsAt ?? new Date(defaultStart.getTime() + 12 * 3_600_000).toISOString()));
  const [note, setNote] = useState(shift?.note ?? "");
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [generalError, setGeneralError] = useState<unknown>(null);

  const submit = (event: FormEvent) => {
    event.preventDefault();
    setGeneralError(null);
    const parsed = shiftInput.safeParse({ contactId: Number(contactId), role, startsAt: utcInputToIso(startsAt) ?? startsAt, endsAt: utcInputToIso(endsAt) ?? endsAt, note });
    if (!parsed.success) {
      setErrors(Object.fromEntries(parsed.error.issues.map((i) => [String(i.path[0] ?? "form"), i.message])));
      return;
    }
    setErrors({});
    save.mutate(
      { id: shift?.id ?? null, input: parsed.data },
      {
        onSuccess: (saved) => {
          toast.success(shift ? "Shift saved" : "Shift added", `${saved.contactName}, ${saved.role}`);
          onClose();
        },
        onError: (error) => {
          toast.error("Shift not saved", describeErrorLine(error));
          const fieldErrors = fieldErrorsFromApiError(error);
          if (Object.keys(fieldErrors).length) setErrors(fieldErrors);
          else setGeneralError(error);
        },
      },
    );
  };

  return (
    <Dialog open onClose={onClose} title={shift ? "Edit shift" : "New shift"} description="Who is on duty from when to when (UTC).">
      <form onSubmit={submit} noValidate className="flex flex-col gap-3">
        <SelectField label="Who" value={contactId} onChange={(e) => setContactId(e.target.value)} error={errors.contactId}>
          {contacts.map((c) => (
            <option key={c.id} value={String(c.id)} disabled={!c.active}>
              {c.name}
              {c.active ? "" : " (inactive)"}
            </option>
          ))}
        </SelectField>
        <SelectField label="Role on shift" value={role} onChange={(e) => setRole(e.target.value as ShiftRole)} error={errors.role}>
          {SHIFT_ROLES.map((r) => (
            <option key={r} value={r}>
              {ROLE_LABELS[r]}
            </option>
          ))}
        </SelectField>
        <div className="grid grid-cols-2 gap-2">
          <TextField label="Starts (UTC)" type="datetime-local" value={startsAt} onChange={(e) => setStartsAt(e.target.value)} error={errors.startsAt} />
          <TextField label="Ends (UTC)" type="datetime-local" value={endsAt} onChange={(e) => setEndsAt(e.target.value)} error={errors.endsAt} />
        </div>
        <TextField label="Note" value={note} onChange={(e) => setNote(e.target.value)} error={errors.note} />
        <FormFooter error={generalError} pending={save.isPending} submitLabel={shift ? "Save shift" : "Add shift"} pendingLabel="Saving…" onCancel={onClose} />
      </form>
    </Dialog>
  );
}
