import type { UseMutationResult } from "@tanstack/react-query";
import { Button } from "@/components/ui/button.tsx";
import { useToast } from "@/components/ui/toaster.tsx";
import { describeErrorLine } from "@/lib/describe-error.ts";

/** A Delete button that asks first and reports the outcome; the server says why when something is still in use. */
export function ConfirmDeleteButton({ id, what, label, mutation }: { id: number; what: string; label: string; mutation: UseMutationResult<void, Error, number> }) {
  const toast = useToast();
  return (
    <Button
      size="sm"
      variant="danger"
      aria-label={label}
      disabled={mutation.isPending}
      onClick={() => {
        if (!window.confirm(`${label}?`)) return;
        mutation.mutate(id, { onSuccess: () => toast.success(`${what} deleted`), onError: (error) => toast.error(`${what} not deleted`, describeErrorLine(error)) });
      }}
    >
      Delete
    </Button>
  );
}
