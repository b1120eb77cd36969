import { Link } from "react-router-dom";
import { SectionBoundary } from "@/components/errors/section-boundary.tsx";
import { Loading } from "@/components/ui/loading.tsx";
import { Notice } from "@/components/ui/notice.tsx";
import { PageHeader } from "@/components/ui/page-header.tsx";
import { rulePaths } from "@/config/paths.ts";
import { describeError } from "@/lib/describe-error.ts";
import { formatCount, formatNumber } from "@/lib/format-units.ts";
import { useRules } from "../api/get-rules.ts";
import type { ZoneOption } from "../editor/rule-editor-types.ts";
import { RulesTable } from "./rules-table.tsx";

/** The office's rules: severity, on/off, zones (flagging zones that cover nothing), version and who changed it last. */
export function RulesPage({ canEdit, zones }: { canEdit: boolean; zones: readonly ZoneOption[] }) {
  const rules = useRules();
  const on = rules.data?.filter((r) => r.enabled).length ?? 0;
  const summary = rules.data
    ? `${formatCount(rules.data.length, "rule")}, ${formatNumber(on)} switched on. Every save is kept as a version.`
    : "Threshold rules over the computed fields, checked on every new frame.";
  return (
    <>
      <PageHeader
        title="Rules"
        description={summary}
        actions={
          canEdit ? (
            <Link to={rulePaths.create()} className="inline-flex h-9 items-center rounded bg-accent px-3.5 text-sm font-medium text-accent-ink hover:brightness-110">
              New rule
            </Link>
          ) : undefined
        }
      />
      {!canEdit && <p className="mb-3 text-muted">Only leads write and switch rules; you can read every rule and its history.</p>}
      <SectionBoundary label="the rules table">
        {rules.isPending && <Loading label="Loading rules…" />}
        {rules.isError && (
          <Notice tone="danger" title="Could not load the rules">
            {describeError(rules.error).message}
          </Notice>
        )}
        {rules.data && rules.data.length === 0 && <Notice title="No rules yet">{canEdit ? "Write the first one with New rule." : "A lead has not written any yet."}</Notice>}
        {rules.data && rules.data.length > 0 && <RulesTable rules={rules.data} canEdit={canEdit} zones={zones} />}
      </SectionBoundary>
    </>
  );
}
