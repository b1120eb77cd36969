import { useEffect, useState } from "react";
import { TextField } from "@/components/ui/text-field.tsx";
import type { RuleFormInput } from "./rule-form-values.ts";
import type { RecipientOption } from "./rule-editor-types.ts";

type Recipients = RuleFormInput["recipients"];

/** "3, 5" ↔ [3, 5]; anything that is not a whole positive number is reported, not guessed at. */
function IdListField({ label, value, onChange, disabled, error }: { label: string; value: readonly number[]; onChange: (ids: number[]) => void; disabled?: boolean; error?: string }) {
  const [text, setText] = useState(value.join(", "));
  const [bad, setBad] = useState<string | null>(null);
  useEffect(() => {
    setText((current) => (parseIds(current).ids.join(",") === value.join(",") ? current : value.join(", ")));
  }, [value]);
  return (
    <TextField
      label={label}
      mono
      autoComplete="off"
      placeholder="none"
      value={text}
      disabled={disabled}
      error={bad ?? error}
      hint="Ids separated by commas."
      onChange={(event) => {
        setText(event.target.value);
        const parsed = parseIds(event.target.value);
        setBad(parsed.bad.length ? `Not an id: ${parsed.bad.join(", ")}` : null);
        onChange(parsed.ids);
      }}
    />
  );
}

function parseIds(text: string): { ids: number[]; bad: string[] } {
  const ids: number[] = [];
  const bad: string[] = [];
  for (const part of text.split(/[\s,]+/).filter(Boolean)) {
    if (/^\d+$/.test(part) && Number(part) > 0) ids.push(Number(part));
    else bad.push(part);
  }
  return { ids, bad };
}

function OptionChecks({ legend, options, value, onChange, disabled }: { legend: string; options: readonly RecipientOption[]; value: readonly number[]; onChange: (ids: number[]) => void; disabled?: boolean }) {
  const chosen = new Set(value);
  // A stored id that is no longer listed stays visible (and can be unticked) rather than silently kept.
  const listed = new Set(options.map((o) => o.id));
  const shown = [...options, ...value.filter((id) => !listed.has(id)).map((id) => ({ id, label: `#${id} (no longer listed)` }))];
  return (
    <fieldset className="flex flex-col gap-1">
      <legend className="mb-1 text-xs font-medium text-muted">{legend}</legend>
      {shown.length === 0 && <p className="text-xs text-muted">None set up yet.</p>}
      {shown.map((o) => (
        <label key={o.id} className="flex items-center gap-2">
          <input type="checkbox" checked={chosen.has(o.id)} disabled={disabled} onChange={() => onChange(chosen.has(o.id) ? value.filter((v) => v !== o.id) : [...value, o.id])} />
          {o.label}
        </label>
      ))}
    </fieldset>
  );
}

/**
 * Who hears about a trigger: the forecaster on call, named contacts and contact groups, picked
 * from the office's lists. Roles that cannot read those lists see (and could type) the ids.
 */
export function RecipientsFields({
  value,
  onChange,
  contacts,
  groups,
  errors,
  disabled,
}: {
  value: Recipients;
  onChange: (next: Recipients) => void;
  contacts: readonly RecipientOption[] | null;
  groups: readonly RecipientOption[] | null;
  errors: Record<string, string>;
  disabled?: boolean;
}) {
  return (
    <div className="flex flex-col gap-2">
      <label className="flex items-center gap-2">
        <input type="checkbox" role="switch" checked={value.onCall} disabled={disabled} onChange={(e) => onChange({ ...value, onCall: e.target.checked })} />
        The forecaster on call
      </label>
      <div className="grid grid-cols-2 gap-2">
        {contacts ? (
          <OptionChecks legend="Contacts" options={contacts} value={value.contactIds} disabled={disabled} onChange={(contactIds) => onChange({ ...value, contactIds })} />
        ) : (
          // Roles that cannot read the contact list see the stored ids.
          <IdListField label="Contact ids" value={value.contactIds} disabled={disabled} error={errors.contactIds} onChange={(contactIds) => onChange({ ...value, contactIds })} />
        )}
        {groups ? (
          <OptionChecks legend="Contact groups" options={groups} value={value.groupIds} disabled={disabled} onChange={(groupIds) => onChange({ ...value, groupIds })} />
        ) : (
          <IdListField label="Contact group ids" value={value.groupIds} disabled={disabled} error={errors.groupIds} onChange={(groupIds) => onChange({ ...value, groupIds })} />
        )}
      </div>
      {errors[""] && <p className="text-xs text-danger">{errors[""]}</p>}
    </div>
  );
}
