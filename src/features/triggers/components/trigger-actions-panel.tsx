import { useState, type FormEvent, type ReactNode } from "react";
import type { TriggerDetailDto } from "@shared/api/triggers.ts";
import { Button } from "@/components/ui/button.tsx";
import { Notice } from "@/components/ui/notice.tsx";
import { Panel } from "@/components/ui/panel.tsx";
import { useToast } from "@/components/ui/toaster.tsx";
import { describeError } from "@/lib/describe-error.ts";
import { useAcknowledgeTrigger, useCloseAsFalseAlarm, useCommentOnTrigger } from "../api/trigger-actions.ts";

export interface TriggerPermissions {
  canAcknowledge: boolean;
  canComment: boolean;
  canClose: boolean;
}

/** One small form: a text box, a button, and the server's refusal in words when there is one. */
function ActionForm({
  label,
  hint,
  button,
  tone = "secondary",
  required,
  minLength,
  pending,
  error,
  onSubmit,
}: {
  label: string;
  hint: ReactNode;
  button: string;
  tone?: "primary" | "secondary" | "danger";
  required: boolean;
  minLength?: number;
  pending: boolean;
  error: unknown;
  onSubmit: (text: string, clear: () => void) => void;
}) {
  const [text, setText] = useState("");
  const submit = (event: FormEvent) => {
    event.preventDefault();
    onSubmit(text, () => setText(""));
  };
  return (
    <form onSubmit={submit} className="flex flex-col gap-1.5">
      <label className="flex flex-col gap-1">
        <span className="text-xs font-medium text-muted">{label}</span>
        <textarea
          rows={2}
          maxLength={2000}
          required={required}
          minLength={minLength}
          value={text}
          onChange={(event) => setText(event.target.value)}
          className="rounded border border-line bg-canvas px-2.5 py-1.5 text-ink"
        />
      </label>
      <p className="text-xs text-muted">{hint}</p>
      {error !== null && error !== undefined && (
        <Notice tone="danger" title={`${button}: refused`}>
          {describeError(error).message}
        </Notice>
      )}
      <div>
        <Button type="submit" size="sm" variant={tone} disabled={pending}>
          {pending ? "Sending…" : button}
        </Button>
      </div>
    </form>
  );
}

/**
 * What the signed-in roles may do with this trigger: acknowledge it while open (forecasters and
 * leads), comment on it, or close it as a false alarm with a reason (leads). The server checks the
 * same permissions; this only leaves out what would be refused.
 */
export function TriggerActionsPanel({ trigger, permissions }: { trigger: TriggerDetailDto; permissions: TriggerPermissions }) {
  const toast = useToast();
  const acknowledge = useAcknowledgeTrigger();
  const comment = useCommentOnTrigger();
  const falseAlarm = useCloseAsFalseAlarm();
  const active = trigger.state === "open" || trigger.state === "acknowledged";
  const showAcknowledge = permissions.canAcknowledge && trigger.state === "open";
  const showClose = permissions.canClose && active;

  if (!showAcknowledge && !permissions.canComment && !showClose) {
    return (
      <Panel title="Actions">
        <p className="text-muted">{active ? "Your roles can read this trigger but not act on it." : `This trigger is closed (${trigger.state}); nothing more can be done with it.`}</p>
      </Panel>
    );
  }

  return (
    <Panel title="Actions">
      <div className="flex flex-col gap-5">
        {showAcknowledge && (
          <ActionForm
            label="Acknowledgement note (optional)"
            hint="Acknowledging tells the office you are on it and stops escalation."
            button="Acknowledge"
            tone="primary"
            required={false}
            pending={acknowledge.isPending}
            error={acknowledge.error}
            onSubmit={(note, clear) => acknowledge.mutate({ triggerId: trigger.id, note }, { onSuccess: () => (clear(), toast.success("Acknowledged")) })}
          />
        )}
        {permissions.canComment && (
          <ActionForm
            label="Comment"
            hint="Comments go into the trigger's events for the log and the next shift."
            button="Add comment"
            required
            minLength={1}
            pending={comment.isPending}
            error={comment.error}
            onSubmit={(text, clear) => comment.mutate({ triggerId: trigger.id, text }, { onSuccess: () => (clear(), toast.success("Comment added")) })}
          />
        )}
        {showClose && (
          <ActionForm
            label="Reason it is a false alarm"
            hint="Closes the trigger for good; the reason is kept for verification."
            button="Close as false alarm"
            tone="danger"
            required
            minLength={3}
            pending={falseAlarm.isPending}
            error={falseAlarm.error}
            onSubmit={(reason, clear) => falseAlarm.mutate({ triggerId: trigger.id, reason }, { onSuccess: () => (clear(), toast.success("Closed as a false alarm")) })}
          />
        )}
      </div>
    </Panel>
  );
}
