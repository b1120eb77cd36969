import { useState } from "react";
import { Link, useNavigate } from "react-router-dom";
import type { RuleDto, UpdateRuleInput } from "@shared/api/rules.ts";
import { Button } from "@/components/ui/button.tsx";
import { SectionBoundary } from "@/components/errors/section-boundary.tsx";
import { Loading } from "@/components/ui/loading.tsx";
import { Notice } from "@/components/ui/notice.tsx";
import { PageHeader } from "@/components/ui/page-header.tsx";
import { useToast } from "@/components/ui/toaster.tsx";
import { paths, rulePaths } from "@/config/paths.ts";
import { describeError } from "@/lib/describe-error.ts";
import { formatUtcDateTime } from "@/lib/time.ts";
import { useRule } from "../api/get-rule.ts";
import { useCreateRule, useUpdateRule } from "../api/save-rule.ts";
import { RuleEditorForm } from "../editor/rule-editor-form.tsx";
import type { RecipientOptions, ZoneOption } from "../editor/rule-editor-types.ts";
import { createInputFrom } from "../editor/rule-form-values.ts";
import { ArchiveRuleDialog } from "./archive-rule-dialog.tsx";

interface Props {
  canEdit: boolean;
  canBacktest: boolean;
  zones: readonly ZoneOption[];
  recipients: RecipientOptions;
}

const linkClass = "inline-flex h-9 items-center rounded border border-line bg-raised px-3.5 text-sm font-medium hover:border-muted";

/** A new rule (leads only). */
export function NewRulePage({ canEdit, zones, recipients }: Omit<Props, "canBacktest">) {
  const createRule = useCreateRule();
  const navigate = useNavigate();
  const toast = useToast();
  const save = (values: UpdateRuleInput) =>
    createRule.mutate(createInputFrom(values), {
      onSuccess: (rule) => {
        toast.success(`${rule.name} saved`, "Version 1.");
        navigate(rulePaths.detail(rule.id), { replace: true });
      },
    });
  return (
    <>
      <PageHeader title="New rule" description="Write the condition over the field catalogue, choose where and when it applies and who hears about it." />
      {canEdit ? (
        <RuleEditorForm rule={null} canEdit zones={zones} recipients={recipients} saving={createRule.isPending} saveError={createRule.error} onSave={save} />
      ) : (
        <Notice title="Only leads write rules">
          <Link to={paths.rules} className="text-accent hover:underline">
            Back to the rules
          </Link>
        </Notice>
      )}
    </>
  );
}

/** One rule: editable for leads, read-only for everyone else; each save is a new version. */
export function RuleEditorPage({ ruleId, ...props }: Props & { ruleId: number }) {
  const rule = useRule(ruleId);
  if (rule.isPending) return <Loading label="Loading the rule…" />;
  if (rule.isError) {
    return (
      <Notice tone="danger" title="Could not load the rule">
        {describeError(rule.error).message}
      </Notice>
    );
  }
  // Keyed by version: after a save the form starts again from what was stored.
  return <LoadedRule key={rule.data.current.id} rule={rule.data} {...props} />;
}

function LoadedRule({ rule, canEdit, canBacktest, zones, recipients }: Props & { rule: RuleDto }) {
  const updateRule = useUpdateRule();
  const toast = useToast();
  const [archiving, setArchiving] = useState(false);
  const save = (values: UpdateRuleInput) =>
    updateRule.mutate(
      { id: rule.id, input: values },
      { onSuccess: (updated) => toast.success(`${updated.name} saved`, `Version ${updated.current.version}.`) },
    );
  const { current } = rule;
  return (
    <>
      <PageHeader
        title={rule.name}
        description={
          <>
            Version {current.version}, saved {formatUtcDateTime(current.createdAt)} by {current.createdBy ?? "the system"}
            {current.changeNote ? ` (“${current.changeNote}”)` : ""}.
            {!canEdit && " Read-only: only leads edit rules."}
          </>
        }
        actions={
          <>
            <Link to={rulePaths.history(rule.id)} className={linkClass}>
              History
            </Link>
            {canBacktest && (
              <Link to={rulePaths.backtest(rule.id)} className={linkClass}>
                Backtest
              </Link>
            )}
            {canEdit && (
              <Button variant="danger" onClick={() => setArchiving(true)}>
                Archive
              </Button>
            )}
          </>
        }
      />
      {rule.emptyZoneIds.length > 0 && (
        <div className="mb-3">
          <Notice tone="caution" title="A zone of this rule covers no grid point">
            {rule.emptyZoneIds.map((id) => zones.find((z) => z.id === id)?.code ?? `#${id}`).join(", ")} cover no point of at least one stored grid; the rule can
            never fire there.
          </Notice>
        </div>
      )}
      <SectionBoundary label="the rule editor">
        <RuleEditorForm rule={rule} canEdit={canEdit} zones={zones} recipients={recipients} saving={updateRule.isPending} saveError={updateRule.error} onSave={save} />
      </SectionBoundary>
      {archiving && <ArchiveRuleDialog rule={rule} onClose={() => setArchiving(false)} />}
    </>
  );
}
