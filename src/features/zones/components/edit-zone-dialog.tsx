import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { createZoneInput, type UpdateZoneInput, type ZoneDto } from "@shared/api/zones.ts";
import { Dialog } from "@/components/ui/dialog.tsx";
import { FormFooter } from "@/components/ui/form-footer.tsx";
import { TextField } from "@/components/ui/text-field.tsx";
import { useToast } from "@/components/ui/toaster.tsx";
import { describeErrorLine } from "@/lib/describe-error.ts";
import { useUpdateZone } from "../api/update-zone.ts";

// The same rules as zone creation, for the two fields this dialog edits.
const editZoneForm = createZoneInput.pick({ code: true, name: true });

export function EditZoneDialog({ zone, onClose }: { zone: ZoneDto; onClose: () => void }) {
  const updateZone = useUpdateZone();
  const toast = useToast();
  const form = useForm({ resolver: zodResolver(editZoneForm), defaultValues: { code: zone.code, name: zone.name } });
  const { errors } = form.formState;

  const submit = form.handleSubmit((values) => {
    // Only what changed is sent, so the audit trail records the real edit.
    const changes: UpdateZoneInput = {};
    if (values.code.toUpperCase() !== zone.code) changes.code = values.code;
    if (values.name !== zone.name) changes.name = values.name;
    if (Object.keys(changes).length === 0) return onClose();
    updateZone.mutate(
      { id: zone.id, changes },
      {
        onSuccess: (updated) => {
          toast.success("Zone updated", `${updated.code} · ${updated.name}`);
          onClose();
        },
        onError: (error) => toast.error("Zone not updated", describeErrorLine(error)),
      },
    );
  });

  return (
    <Dialog open onClose={onClose} title={`Edit zone ${zone.code}`} description="Rename the zone or change its code. Its shape stays as it is.">
      <form onSubmit={submit} noValidate className="flex flex-col gap-3">
        <TextField label="Code" mono autoComplete="off" hint="Letters, digits, dash and underscore; stored in capitals." error={errors.code?.message} {...form.register("code")} />
        <TextField label="Name" autoComplete="off" error={errors.name?.message} {...form.register("name")} />
        <FormFooter error={updateZone.error} pending={updateZone.isPending} submitLabel="Save changes" pendingLabel="Saving…" onCancel={onClose} />
      </form>
    </Dialog>
  );
}
