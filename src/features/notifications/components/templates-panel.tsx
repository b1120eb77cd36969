import { useEffect, useState, type FormEvent } from "react";
import { notifySettingsInput, TEMPLATE_KEYS, TEMPLATE_PLACEHOLDERS, type NotifySettingsDto, type TemplateKey } from "@shared/api/notifications.ts";
import { renderTemplate } from "@shared/notify/template.ts";
import { Button } from "@/components/ui/button.tsx";
import { Loading } from "@/components/ui/loading.tsx";
import { Notice } from "@/components/ui/notice.tsx";
import { Panel } from "@/components/ui/panel.tsx";
import { SelectField } from "@/components/ui/select-field.tsx";
import { useToast } from "@/components/ui/toaster.tsx";
import { describeError, describeErrorLine } from "@/lib/describe-error.ts";
import { useContacts } from "../api/contacts.ts";
import { useNotifySettings, useSaveNotifySettings } from "../api/settings.ts";

const LABELS: Record<TemplateKey, string> = {
  emailSubject: "E-mail subject",
  emailIntro: "E-mail opening line",
  smsText: "Text message (at most 320 characters once filled in; the link is never cut)",
  digestSubject: "Quiet-hours digest subject",
};

/** Sample values for the preview only (an invented trigger). */
const SAMPLE: Record<string, string> = {
  change: "New trigger",
  rule: "Supercell ingredients",
  severity: "Serious",
  zone: "Sample zone",
  zoneCode: "SMP",
  validUtc: "2026-05-14 18:00Z to 21:00Z",
  validLocal: "Thu 14 May 13:00 CDT to Thu 14 May 16:00 CDT",
  model: "sample-model",
  run: "2026-05-14 12Z",
  level: "1",
  link: "https://bellwether.example/triggers/123",
  count: "3",
  contact: "Sample Contact",
};

/** The office's wording of subjects and texts, and the last escalation contact. */
export function TemplatesPanel({ canWrite }: { canWrite: boolean }) {
  const settings = useNotifySettings();
  const contacts = useContacts();
  const save = useSaveNotifySettings();
  const toast = useToast();
  const [draft, setDraft] = useState<NotifySettingsDto | null>(null);
  const [errors, setErrors] = useState<Record<string, string>>({});

  useEffect(() => {
    if (settings.data && !draft) setDraft(settings.data);
  }, [settings.data, draft]);

  if (settings.isPending || !draft) return settings.isError ? <Notice tone="danger" title="Could not load the settings">{describeError(settings.error).message}</Notice> : <Loading label="Loading settings…" />;

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const parsed = notifySettingsInput.safeParse({ templates: draft.templates, escalationContactId: draft.escalationContactId });
    if (!parsed.success) {
      setErrors(Object.fromEntries(parsed.error.issues.map((i) => [i.path.join("."), i.message])));
      return;
    }
    setErrors({});
    save.mutate(parsed.data, {
      onSuccess: (saved) => {
        setDraft(saved);
        toast.success("Notification settings saved");
      },
      onError: (error) => toast.error("Settings not saved", describeErrorLine(error)),
    });
  };

  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-4">
      <Panel title="Delivery">
        <dl className="grid grid-cols-[12rem_1fr] gap-y-1 text-sm">
          <dt className="text-muted">E-mail goes through</dt>
          <dd>{draft.mailTransport === "fake" ? "the local SMTP fake (no real mail leaves this machine)" : "the office's SMTP server"}</dd>
          <dt className="text-muted">Texts go through</dt>
          <dd>{draft.smsTransport === "fake" ? "the local SMS fake (no real text leaves this machine)" : "the hosted text-message provider"}</dd>
          <dt className="text-muted">Escalation after</dt>
          <dd>{draft.escalationMinutes} min per level unless a rule sets its own (ESCALATION_MINUTES)</dd>
          <dt className="text-muted">Office time zone</dt>
          <dd className="font-mono">{draft.officeTimeZone}</dd>
        </dl>
        <div className="mt-3 max-w-md">
          <SelectField
            label="Last escalation level: named contact"
            value={draft.escalationContactId === null ? "" : String(draft.escalationContactId)}
            disabled={!canWrite}
            onChange={(e) => setDraft({ ...draft, escalationContactId: e.target.value ? Number(e.target.value) : null })}
            error={errors.escalationContactId}
            hint="Level 1 is the lead on shift; level 2 is this contact."
          >
            <option value="">Nobody (escalation stops at the lead on shift)</option>
            {(contacts.data ?? []).map((c) => (
              <option key={c.id} value={String(c.id)}>
                {c.name}
              </option>
            ))}
          </SelectField>
        </div>
      </Panel>
      <Panel title="Templates" actions={canWrite ? <Button type="submit" variant="primary" size="sm" disabled={save.isPending}>{save.isPending ? "Saving…" : "Save settings"}</Button> : undefined}>
        <div className="flex flex-col gap-4">
          {TEMPLATE_KEYS.map((key) => {
            const error = errors[`templates.${key}`];
            return (
              <div key={key} className="flex flex-col gap-1">
                <label htmlFor={`template-${key}`} className="text-xs font-medium text-muted">
                  {LABELS[key]}
                </label>
                <textarea
                  id={`template-${key}`}
                  rows={key === "emailIntro" || key === "smsText" ? 3 : 2}
                  readOnly={!canWrite}
                  aria-invalid={error ? true : undefined}
                  className={`rounded border bg-canvas px-2.5 py-1.5 font-mono text-sm [font-variant-ligatures:none] ${error ? "border-danger" : "border-line"}`}
                  value={draft.templates[key]}
                  onChange={(e) => setDraft({ ...draft, templates: { ...draft.templates, [key]: e.target.value } })}
                />
                <p className="text-xs text-muted">Placeholders: {TEMPLATE_PLACEHOLDERS[key].map((p) => `{${p}}`).join(" ")}</p>
                {error && <p className="text-xs text-danger">{error}</p>}
                <p className="text-xs">
                  <span className="text-muted">Sample: </span>
                  {renderTemplate(draft.templates[key], SAMPLE)}
                </p>
              </div>
            );
          })}
        </div>
      </Panel>
    </form>
  );
}
