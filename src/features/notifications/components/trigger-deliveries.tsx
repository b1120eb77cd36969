import { useQueryClient } from "@tanstack/react-query";
import type { NotificationDto } from "@shared/api/notifications.ts";
import { can } from "@shared/auth/permissions.ts";
import { Button } from "@/components/ui/button.tsx";
import { Chip } from "@/components/ui/chip.tsx";
import { Loading } from "@/components/ui/loading.tsx";
import { Notice } from "@/components/ui/notice.tsx";
import { Panel } from "@/components/ui/panel.tsx";
import { Timestamp } from "@/components/ui/timestamp.tsx";
import { useToast } from "@/components/ui/toaster.tsx";
import { useServerEvents } from "@/hooks/use-server-events.ts";
import { useSignedInUser } from "@/lib/auth.ts";
import { describeError, describeErrorLine } from "@/lib/describe-error.ts";
import { useResendNotification, useTriggerDeliveries } from "../api/deliveries.ts";
import { notifyKeys } from "../api/notify-keys.ts";
import { channelLabel, deliverySummary, reasonLabel, resultOf } from "../delivery-words.ts";

function WhenCell({ n }: { n: NotificationDto }) {
  if (n.state === "sent") return <Timestamp value={n.sentAt} />;
  if (n.state === "held") return <span>until <Timestamp value={n.heldUntil} /></span>;
  if (n.state === "queued" && n.attempts > 0) return <span>next try <Timestamp value={n.nextAttemptAt} /></span>;
  return <Timestamp value={n.createdAt} />;
}

function AttemptLog({ n }: { n: NotificationDto }) {
  if (n.attemptLog.length === 0) return <span className="text-xs text-muted">No attempt yet</span>;
  return (
    <details className="text-xs">
      <summary className="cursor-pointer text-muted">
        {n.attempts} attempt{n.attempts === 1 ? "" : "s"}
        {n.lastError && n.state !== "sent" ? " · last error" : ""}
      </summary>
      <ol className="mt-1 flex flex-col gap-0.5">
        {n.attemptLog.map((a) => (
          <li key={a.attempt} className="font-mono">
            #{a.attempt} {a.outcome} <Timestamp value={a.startedAt} />
            {a.providerMessageId && <span className="text-muted"> · id {a.providerMessageId}</span>}
            {a.error && <span className="block break-words text-danger">{a.error}</span>}
          </li>
        ))}
      </ol>
    </details>
  );
}

/**
 * Who was told about one trigger, how, when, and with which result: every e-mail and text the
 * outbox wrote for it (escalations and quiet-hours digests included), each attempt on record.
 * Refreshes when the trigger changes (a send or a failure adds an event) and while sends are in
 * flight. Leads and admins can send a failed message again.
 */
export function TriggerDeliveries({ triggerId }: { triggerId: number }) {
  const deliveries = useTriggerDeliveries(triggerId);
  const resend = useResendNotification(triggerId);
  const queryClient = useQueryClient();
  const toast = useToast();
  const user = useSignedInUser();
  const canResend = can(user.roles, "notifications.resend");

  useServerEvents({
    "trigger.changed": (event) => {
      if (event.triggerId === triggerId) void queryClient.invalidateQueries({ queryKey: notifyKeys.deliveries(triggerId) });
    },
    onOpen: () => void queryClient.invalidateQueries({ queryKey: notifyKeys.deliveries(triggerId) }),
  });

  const list = deliveries.data ?? [];
  return (
    <Panel title="Deliveries" actions={list.length > 0 ? <span className="text-xs text-muted">{deliverySummary(list)}</span> : undefined}>
      {deliveries.isPending && <Loading label="Loading deliveries…" />}
      {deliveries.isError && (
        <Notice tone="danger" title="Could not load the deliveries">
          {describeError(deliveries.error).message}
        </Notice>
      )}
      {deliveries.data && list.length === 0 && <p className="text-muted">No message was written for this trigger. Its events say why.</p>}
      {list.length > 0 && (
        // A list rather than a table: the trigger page shows this in a narrow column.
        <ul className="flex flex-col" data-testid="trigger-deliveries" aria-label={`Messages sent about trigger ${triggerId}`}>
          {list.map((n) => {
            const result = resultOf(n);
            return (
              <li key={n.id} className="border-b border-line/60 py-2 text-sm last:border-0">
                <div className="flex items-start justify-between gap-2">
                  <span className="min-w-0 font-medium">{n.recipientName}</span>
                  <Chip tone={result.tone}>{result.label}</Chip>
                </div>
                <div className="text-xs text-muted">
                  {channelLabel(n)} · {reasonLabel(n)} · <WhenCell n={n} />
                </div>
                <div className="font-mono text-xs break-all text-muted">{n.address}</div>
                <div className="mt-0.5 flex items-start justify-between gap-2">
                  <AttemptLog n={n} />
                  {canResend && n.state === "failed" && (
                    <Button
                      size="sm"
                      disabled={resend.isPending}
                      onClick={() =>
                        resend.mutate(n.id, {
                          onSuccess: () => toast.success("Queued again", `${channelLabel(n)} to ${n.recipientName}`),
                          onError: (error) => toast.error("Could not queue it again", describeErrorLine(error)),
                        })
                      }
                    >
                      Send again
                    </Button>
                  )}
                </div>
              </li>
            );
          })}
        </ul>
      )}
    </Panel>
  );
}
