import { SelectField } from "@/components/ui/select-field.tsx";
import { useFilterOptions, useRuleVersions } from "../api/get-filter-options.ts";

/** A rule and, once one is chosen, one of its saved versions (newest first, with its change note). */
export function RuleVersionSelects({
  ruleId,
  versionId,
  everyRuleLabel,
  onRule,
  onVersion,
}: {
  ruleId: string;
  versionId: string;
  everyRuleLabel: string;
  onRule: (ruleId: string) => void;
  onVersion: (versionId: string) => void;
}) {
  const options = useFilterOptions();
  const versions = useRuleVersions(ruleId ? Number(ruleId) : undefined);
  return (
    <>
      <SelectField label="Rule" value={ruleId} onChange={(e) => onRule(e.target.value)}>
        <option value="">{everyRuleLabel}</option>
        {options.data?.rules.map((r) => (
          <option key={r.id} value={r.id}>
            {r.name}
          </option>
        ))}
      </SelectField>
      <SelectField label="Rule version" value={versionId} onChange={(e) => onVersion(e.target.value)} disabled={!ruleId}>
        <option value="">{ruleId ? "Every version" : "Pick a rule first"}</option>
        {versions.data?.map((v) => (
          <option key={v.id} value={v.id}>
            v{v.version}
            {v.changeNote ? ` — ${v.changeNote}` : ""}
          </option>
        ))}
      </SelectField>
    </>
  );
}
