import { useEffect, useRef, useState } from "react";
import type { TriggerSummaryDto } from "@shared/api/triggers.ts";
import { Button } from "@/components/ui/button.tsx";
import { Dialog } from "@/components/ui/dialog.tsx";
import { Notice } from "@/components/ui/notice.tsx";
import { describeError } from "@/lib/describe-error.ts";
import { useAcknowledgeTrigger } from "../api/trigger-actions.ts";

/**
 * Acknowledges one trigger with an optional note. Enter sends (Shift+Enter starts a new line), so
 * "a" then Enter is the quickest acknowledgement from the keyboard.
 */
export function AcknowledgeDialog({ trigger, onClose, onDone }: { trigger: TriggerSummaryDto | null; onClose: () => void; onDone?: (trigger: TriggerSummaryDto) => void }) {
  const [note, setNote] = useState("");
  const acknowledge = useAcknowledgeTrigger();
  const noteField = useRef<HTMLTextAreaElement>(null);
  // The native dialog focuses its first button (Close) when it opens; this effect runs after that,
  // so the note field gets the keys and "a" then Enter acknowledges.
  useEffect(() => {
    if (trigger) noteField.current?.focus();
  }, [trigger]);
  const close = () => {
    setNote("");
    acknowledge.reset();
    onClose();
  };
  const send = () => {
    if (!trigger || acknowledge.isPending) return;
    acknowledge.mutate(
      { triggerId: trigger.id, note },
      {
        onSuccess: (updated) => {
          onDone?.(updated);
          close();
        },
      },
    );
  };
  return (
    <Dialog
      open={trigger !== null}
      onClose={close}
      title="Acknowledge trigger"
      description={trigger ? `${trigger.rule.name} · ${trigger.zone.code} ${trigger.zone.name}` : undefined}
    >
      <form
        className="flex flex-col gap-3"
        onSubmit={(event) => {
          event.preventDefault();
          send();
        }}
      >
        <label className="flex flex-col gap-1">
          <span className="text-xs font-medium text-muted">Note (optional)</span>
          <textarea
            ref={noteField}
            rows={3}
            maxLength={2000}
            value={note}
            onChange={(event) => setNote(event.target.value)}
            onKeyDown={(event) => {
              if (event.key === "Enter" && !event.shiftKey) {
                event.preventDefault();
                send();
              }
            }}
            placeholder="What you are doing about it, for the log"
            className="rounded border border-line bg-canvas px-2.5 py-1.5 text-ink placeholder:text-muted/70"
          />
          <span className="text-xs text-muted">Enter acknowledges; Shift+Enter starts a new line.</span>
        </label>
        {acknowledge.isError && (
          <Notice tone="danger" title="Not acknowledged">
            {describeError(acknowledge.error).message}
          </Notice>
        )}
        <div className="flex justify-end gap-2">
          <Button onClick={close}>Cancel</Button>
          <Button type="submit" variant="primary" disabled={acknowledge.isPending}>
            {acknowledge.isPending ? "Acknowledging…" : "Acknowledge"}
          </Button>
        </div>
      </form>
    </Dialog>
  );
}
