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
  if (n.state === "held") return <span className="text-xs text-muted">until <Timestamp value={n.heldUntil} /></span>;
  if (n.state === "queued" && n.attempts > 0) return <span className="text-xs text-muted">next try <Timestamp value={n.nextAttemptAt} /></span>;
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
        <div className="overflow-x-auto">
          <table className="w-full text-left text-sm" data-testid="trigger-deliveries">
            <caption className="sr-only">Messages sent about trigger {triggerId}</caption>
            <thead className="border-b border-line text-xs text-muted">
              <tr>
                <th scope="col" className="py-1.5 pr-3 font-medium">Recipient</th>
                <th scope="col" className="py-1.5 pr-3 font-medium">Channel</th>
                <th scope="col" className="py-1.5 pr-3 font-medium">Why</th>
                <th scope="col" className="py-1.5 pr-3 font-medium">Result</th>
                <th scope="col" className="py-1.5 pr-3 font-medium">When</th>
                <th scope="col" className="py-1.5 pr-3 font-medium">Attempts</th>
                {canResend && <th scope="col" className="py-1.5 font-medium"><span className="sr-only">Actions</span></th>}
              </tr>
            </thead>
            <tbody>
              {list.map((n) => {
                const result = resultOf(n);
                return (
                  <tr key={n.id} className="border-b border-line/60 align-top last:border-0">
                    <td className="py-1.5 pr-3">
                      <div>{n.recipientName}</div>
                      <div className="font-mono text-xs text-muted">{n.address}</div>
                    </td>
                    <td className="py-1.5 pr-3 whitespace-nowrap">{channelLabel(n)}</td>
                    <td className="py-1.5 pr-3 whitespace-nowrap">{reasonLabel(n)}</td>
                    <td className="py-1.5 pr-3">
                      <Chip tone={result.tone}>{result.label}</Chip>
                    </td>
                    <td className="py-1.5 pr-3">
                      <WhenCell n={n} />
                    </td>
                    <td className="py-1.5 pr-3">
                      <AttemptLog n={n} />
                    </td>
                    {canResend && (
                      <td className="py-1.5 text-right">
                        {n.state === "failed" && (
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
                      </td>
                    )}
                  </tr>
                );
              })}
            </tbody>
          </table>
        </div>
      )}
    </Panel>
  );
}
