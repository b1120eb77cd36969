import { Link } from "react-router-dom";
import type { FakeMailDto, FakeStatusDto } from "@shared/api/notifications.ts";
import { Button } from "@/components/ui/button.tsx";
import { Loading } from "@/components/ui/loading.tsx";
import { Notice } from "@/components/ui/notice.tsx";
import { Panel } from "@/components/ui/panel.tsx";
import { Timestamp } from "@/components/ui/timestamp.tsx";
import { useToast } from "@/components/ui/toaster.tsx";
import { triggerPath } from "@/config/paths.ts";
import { describeError, describeErrorLine } from "@/lib/describe-error.ts";
import { fakeMailAttachmentUrl, useClearFakes, useFakeMail, useFakeSms, useFakesStatus } from "../api/fakes.ts";
import { FakeBehaviourForm } from "./fake-behaviour-form.tsx";

function TriggerLinks({ ids }: { ids: readonly number[] }) {
  if (ids.length === 0) return <span className="text-muted">—</span>;
  return (
    <span className="flex flex-wrap gap-1">
      {ids.map((id) => (
        <Link key={id} to={triggerPath(id)} className="text-accent underline">
          #{id}
        </Link>
      ))}
    </span>
  );
}

function StatusLine({ name, status }: { name: string; status: FakeStatusDto }) {
  return (
    <p className="text-sm">
      <span className="font-medium">{name}</span>{" "}
      {status.running ? <span className="font-mono text-xs">{status.address}</span> : <span className="text-muted">not running (real credentials are configured)</span>}
      <span className="text-muted">
        {" "}
        · {status.received} stored · {status.duplicatesIgnored} repeats dropped · {status.refused} refused
      </span>
    </p>
  );
}

function MailItem({ mail }: { mail: FakeMailDto }) {
  const imageIndex = mail.attachments.findIndex((a) => a.contentType === "image/png");
  return (
    <li className="border-b border-line/60 py-2 last:border-0">
      <details>
        <summary className="cursor-pointer">
          <span className="font-medium">{mail.subject}</span>
          <span className="ml-2 text-xs text-muted">
            to {mail.to.join(", ")} · <Timestamp value={mail.receivedAt} />
          </span>
        </summary>
        <div className="mt-2 grid gap-3 md:grid-cols-[1fr_auto]">
          <pre className="max-h-80 overflow-auto rounded bg-raised p-2 text-xs whitespace-pre-wrap">{mail.text}</pre>
          {imageIndex >= 0 && <img src={fakeMailAttachmentUrl(mail.id, imageIndex)} alt={`Map attached to “${mail.subject}”`} className="max-w-64 rounded border border-line" />}
        </div>
        <p className="mt-1 text-xs text-muted">
          Trigger(s): <TriggerLinks ids={mail.triggerIds} /> · Message-ID <span className="font-mono">{mail.messageId ?? "none"}</span> · {mail.attachments.length} attachment(s) · HTML part {mail.html ? "present" : "missing"}
        </p>
      </details>
    </li>
  );
}

/**
 * What the local stand-ins for the mail server and the text provider received: the proof that
 * messages left Bellwether, and a place to make the fakes misbehave while watching retries.
 */
export function FakeInboxesPanel() {
  const status = useFakesStatus();
  const mail = useFakeMail();
  const sms = useFakeSms();
  const clear = useClearFakes();
  const toast = useToast();

  return (
    <div className="flex flex-col gap-4">
      <Notice tone="neutral" title="Local fakes">
        These stand in for the hosted mail and text services whenever no real credentials are set. Nothing shown here reached a real person.
      </Notice>
      {status.isError && <Notice tone="danger" title="Could not load the fakes' status">{describeError(status.error).message}</Notice>}
      {status.data && (
        <Panel
          title="Status and behaviour"
          actions={
            <Button
              size="sm"
              variant="danger"
              disabled={clear.isPending}
              onClick={() => {
                if (!window.confirm("Empty both fake inboxes?")) return;
                clear.mutate(undefined, { onSuccess: () => toast.success("Fake inboxes emptied"), onError: (error) => toast.error("Not emptied", describeErrorLine(error)) });
              }}
            >
              Empty both
            </Button>
          }
        >
          <div className="flex flex-col gap-3">
            <StatusLine name="Mail (SMTP)" status={status.data.mail} />
            <FakeBehaviourForm which="mail" status={status.data.mail} />
            <StatusLine name="Texts (SMS API)" status={status.data.sms} />
            <FakeBehaviourForm which="sms" status={status.data.sms} />
          </div>
        </Panel>
      )}
      <div className="grid gap-4 xl:grid-cols-2">
        <Panel title={`Fake mail inbox${mail.data ? ` (${mail.data.length})` : ""}`}>
          {mail.isPending && <Loading label="Loading mail…" />}
          {mail.data && mail.data.length === 0 && <p className="text-muted">No mail received yet.</p>}
          <ul data-testid="fake-mail-list">{mail.data?.map((m) => <MailItem key={m.id} mail={m} />)}</ul>
        </Panel>
        <Panel title={`Fake text messages${sms.data ? ` (${sms.data.length})` : ""}`}>
          {sms.isPending && <Loading label="Loading texts…" />}
          {sms.data && sms.data.length === 0 && <p className="text-muted">No text received yet.</p>}
          <ul data-testid="fake-sms-list">
            {sms.data?.map((s) => (
              <li key={s.id} className="border-b border-line/60 py-2 last:border-0">
                <p className="text-sm">{s.body}</p>
                <p className="text-xs text-muted">
                  to <span className="font-mono">{s.to.join(", ")}</span> · <Timestamp value={s.receivedAt} /> · {s.body.length} characters · trigger(s) <TriggerLinks ids={s.triggerIds} />
                </p>
              </li>
            ))}
          </ul>
        </Panel>
      </div>
    </div>
  );
}
