import { describeError } from "@/lib/describe-error.ts";
import { Button } from "./button.tsx";
import { Notice } from "./notice.tsx";

/** The end of a dialog form: the failure (if any), Cancel, and the submit button with its busy label. */
export function FormFooter({
  error,
  pending,
  submitLabel,
  pendingLabel,
  onCancel,
}: {
  error: unknown;
  pending: boolean;
  submitLabel: string;
  pendingLabel: string;
  onCancel: () => void;
}) {
  return (
    <>
      {error != null && <Notice tone="danger">{describeError(error).message}</Notice>}
      <div className="mt-1 flex justify-end gap-2">
        <Button onClick={onCancel}>Cancel</Button>
        <Button type="submit" variant="primary" disabled={pending}>
          {pending ? pendingLabel : submitLabel}
        </Button>
      </div>
    </>
  );
}
