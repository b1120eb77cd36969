import { useId, useMemo } from "react";
import { Controller, useForm, useWatch, type FieldPath, type UseFormRegisterReturn } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { checkExpression, updateRuleInput, type RuleDto, type UpdateRuleInput } from "@shared/api/rules.ts";
import { Button } from "@/components/ui/button.tsx";
import { useDebouncedValue } from "@/hooks/use-debounced-value.ts";
import { Notice } from "@/components/ui/notice.tsx";
import { Panel } from "@/components/ui/panel.tsx";
import { TextField } from "@/components/ui/text-field.tsx";
import { describeError } from "@/lib/describe-error.ts";
import { fieldErrorsFromApiError } from "@/lib/form-errors.ts";
import { ExpressionEditor } from "./expression-editor.tsx";
import { ExpressionUnitHints } from "./expression-unit-hints.tsx";
import { nestedMessages } from "./form-messages.ts";
import { NumberField } from "./number-field.tsx";
import { RecipientsFields } from "./recipients-fields.tsx";
import type { RecipientOptions, ZoneOption } from "./rule-editor-types.ts";
import { newRuleValues, valuesFromDefinition, type RuleFormInput } from "./rule-form-values.ts";
import { RulePreviewPanel } from "./rule-preview-panel.tsx";
import { SeverityPicker } from "./severity-picker.tsx";
import { SpatialConditionFields } from "./spatial-condition-fields.tsx";
import { ValidTimeWindowFields } from "./valid-time-window-fields.tsx";
import { ZonePicker } from "./zone-picker.tsx";

const PROBLEM_DELAY_MS = 400;

export interface RuleEditorFormProps {
  /** The rule being edited, or null for a new one. */
  rule: RuleDto | null;
  canEdit: boolean;
  zones: readonly ZoneOption[];
  recipients: RecipientOptions;
  saving: boolean;
  saveError: unknown;
  onSave: (values: UpdateRuleInput) => void;
}

/**
 * The rule editor: every part of a rule definition, checked by the same zod schema the server
 * uses, with the expression checked and underlined as it is typed and a live preview beside it.
 * Roles that cannot edit see the same form, read-only, without the preview.
 */
export function RuleEditorForm({ rule, canEdit, zones, recipients, saving, saveError, onSave }: RuleEditorFormProps) {
  const form = useForm<RuleFormInput, unknown, UpdateRuleInput>({
    resolver: zodResolver(updateRuleInput),
    defaultValues: rule ? valuesFromDefinition(rule.current.definition) : newRuleValues(),
  });
  const { errors, isSubmitted } = form.formState;
  const expression = useWatch({ control: form.control, name: "expression" });
  const zoneIds = useWatch({ control: form.control, name: "zoneIds" });
  const spatialCondition = useWatch({ control: form.control, name: "spatialCondition" });
  const check = useMemo(() => checkExpression(expression), [expression]);
  // Problems are shown once typing pauses, so a half-typed name is not flagged at every keystroke.
  const settledExpression = useDebouncedValue(expression, PROBLEM_DELAY_MS);
  const problems = check.ok || settledExpression !== expression ? [] : check.errors;
  const serverErrors = fieldErrorsFromApiError(saveError);
  const disabled = !canEdit;

  const submit = form.handleSubmit((values) => onSave(values));

  // The server's per-field refusals sit beside the fields, like the schema's own messages.
  const messageFor = (path: FieldPath<RuleFormInput>) => (form.getFieldState(path).error?.message as string | undefined) ?? serverErrors[path];

  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-4 xl:flex-row xl:items-start">
      <fieldset disabled={disabled} className="flex min-w-0 flex-1 flex-col gap-4">
        <legend className="sr-only">{rule ? `Rule ${rule.name}` : "New rule"}</legend>
        <Panel title="Rule">
          <div className="flex flex-col gap-3">
            <TextField label="Name" autoComplete="off" error={messageFor("name")} {...form.register("name")} />
            <DescriptionField register={form.register("description")} error={messageFor("description")} />
          </div>
        </Panel>

        <Panel title="Condition">
          <div className="flex flex-col gap-3">
            <Controller
              control={form.control}
              name="expression"
              render={({ field, fieldState }) => (
                <ExpressionEditor
                  label="Expression"
                  value={field.value}
                  onChange={field.onChange}
                  onBlur={field.onBlur}
                  readOnly={disabled}
                  problems={problems}
                  showProblems={field.value.trim() !== "" || fieldState.isTouched || isSubmitted}
                  hint={
                    disabled
                      ? undefined
                      : "Catalogue fields in their stored units, joined with and / or. Suggestions appear as you type (Ctrl+Space to ask); e.g. shear_0_6km >= kt(40) and mlcape >= 1000"
                  }
                />
              )}
            />
            {check.ok && expression !== check.normalised && (
              <p className="text-xs text-muted">
                Reads as <code className="text-ink">{check.normalised}</code>
              </p>
            )}
            <ExpressionUnitHints expression={expression} />
          </div>
        </Panel>

        <Panel title="Where">
          <div className="flex flex-col gap-4">
            <Controller
              control={form.control}
              name="zoneIds"
              render={({ field }) => <ZonePicker zones={zones} value={field.value} onChange={field.onChange} error={messageFor("zoneIds")} disabled={disabled} />}
            />
            <Controller
              control={form.control}
              name="spatialCondition"
              render={({ field }) => (
                <SpatialConditionFields value={field.value} onChange={field.onChange} errors={nestedMessages(errors.spatialCondition)} disabled={disabled} />
              )}
            />
          </div>
        </Panel>

        <Panel title="When">
          <div className="flex flex-col gap-3">
            <Controller
              control={form.control}
              name="validTimeWindow"
              render={({ field }) => (
                <ValidTimeWindowFields value={field.value} onChange={field.onChange} errors={nestedMessages(errors.validTimeWindow)} disabled={disabled} />
              )}
            />
            <div className="grid grid-cols-2 gap-3">
              <Controller
                control={form.control}
                name="persistenceFrames"
                render={({ field }) => (
                  <NumberField
                    label="Persistence (frames)"
                    integer
                    value={field.value ?? 1}
                    onChange={field.onChange}
                    disabled={disabled}
                    error={messageFor("persistenceFrames")}
                    hint="Met in at least this many consecutive frames of one run."
                  />
                )}
              />
              <Controller
                control={form.control}
                name="coolDownHours"
                render={({ field }) => (
                  <NumberField
                    label="Cool-down (hours)"
                    integer
                    value={field.value ?? 6}
                    onChange={field.onChange}
                    disabled={disabled}
                    error={messageFor("coolDownHours")}
                    hint="No new trigger for the same zone within this time, unless the severity rises."
                  />
                )}
              />
            </div>
          </div>
        </Panel>

        <Panel title="Who and how urgent">
          <div className="grid grid-cols-1 gap-4 md:grid-cols-2">
            <Controller control={form.control} name="severity" render={({ field }) => <SeverityPicker value={field.value} onChange={field.onChange} disabled={disabled} />} />
            <div className="flex flex-col gap-3">
              <Controller
                control={form.control}
                name="recipients"
                render={({ field }) => (
                  <RecipientsFields
                    value={field.value}
                    onChange={field.onChange}
                    contacts={recipients.contacts}
                    groups={recipients.groups}
                    errors={{ ...nestedMessages(errors.recipients), ...(serverErrors.recipients ? { "": serverErrors.recipients } : {}) }}
                    disabled={disabled}
                  />
                )}
              />
              <Controller
                control={form.control}
                name="escalateAfterMinutes"
                render={({ field }) => (
                  <TextField
                    label="Escalate after (minutes)"
                    mono
                    inputMode="numeric"
                    autoComplete="off"
                    className="w-48"
                    value={field.value ?? ""}
                    disabled={disabled}
                    error={messageFor("escalateAfterMinutes")}
                    hint="If nobody acknowledges a trigger by then, the lead on shift is told. Empty: the office default."
                    onChange={(event) => {
                      const text = event.target.value.trim();
                      field.onChange(text === "" ? undefined : Number(text));
                    }}
                  />
                )}
              />
              <label className="flex items-center gap-2">
                <input type="checkbox" role="switch" {...form.register("enabled")} />
                Switched on (checked on every new frame)
              </label>
            </div>
          </div>
        </Panel>

        {canEdit && (
          <div className="flex flex-col gap-2">
            {rule && (
              <TextField
                label="Change note"
                autoComplete="off"
                placeholder="Why this change (shown in the history)"
                error={messageFor("changeNote")}
                {...form.register("changeNote")}
              />
            )}
            {saveError != null && Object.keys(serverErrors).length === 0 && <Notice tone="danger">{describeError(saveError).message}</Notice>}
            {isSubmitted && Object.keys(errors).length > 0 && <Notice tone="danger">Some parts need attention; each is marked above.</Notice>}
            <div className="flex justify-end">
              <Button type="submit" variant="primary" disabled={saving}>
                {saving ? "Saving…" : rule ? `Save as version ${rule.current.version + 1}` : "Save rule"}
              </Button>
            </div>
          </div>
        )}
      </fieldset>

      {canEdit && (
        <div className="w-full shrink-0 xl:sticky xl:top-4 xl:w-[26rem]">
          <RulePreviewPanel expression={expression} expressionOk={check.ok} zoneIds={zoneIds} spatialCondition={spatialCondition} zones={zones} />
        </div>
      )}
    </form>
  );
}

function DescriptionField({ register, error }: { register: UseFormRegisterReturn; error?: string }) {
  const id = useId();
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="text-xs font-medium text-muted">
        Description
      </label>
      <textarea id={id} rows={2} className="rounded border border-line bg-canvas px-2.5 py-2 text-ink" {...register} />
      {error && <p className="text-xs text-danger">{error}</p>}
    </div>
  );
}
