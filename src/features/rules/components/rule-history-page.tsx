import { Link, useSearchParams } from "react-router-dom";
import type { RuleVersionDto } from "@shared/api/rules.ts";
import { SectionBoundary } from "@/components/errors/section-boundary.tsx";
import { Loading } from "@/components/ui/loading.tsx";
import { Notice } from "@/components/ui/notice.tsx";
import { PageHeader } from "@/components/ui/page-header.tsx";
import { Panel } from "@/components/ui/panel.tsx";
import { Timestamp } from "@/components/ui/timestamp.tsx";
import { rulePaths } from "@/config/paths.ts";
import { describeError } from "@/lib/describe-error.ts";
import { formatCount } from "@/lib/format-units.ts";
import { useRule } from "../api/get-rule.ts";
import { useRuleVersions } from "../api/get-rule-versions.ts";
import { recipientNamesFor, zoneLabelFor, type RecipientOptions, type ZoneOption } from "../editor/rule-editor-types.ts";
import { diffDefinitions } from "../history/version-diff.ts";
import { VersionDiffView } from "../history/version-diff-view.tsx";

/** Which two versions to compare: from the URL when valid, else the one before the newest against the newest. */
function chosenPair(versions: readonly RuleVersionDto[], search: URLSearchParams): { from: RuleVersionDto; to: RuleVersionDto } | null {
  if (versions.length < 2) return null;
  const byNumber = (n: string | null) => versions.find((v) => String(v.version) === n);
  return { from: byNumber(search.get("from")) ?? versions[1]!, to: byNumber(search.get("to")) ?? versions[0]! };
}

/** Every saved version of a rule (who, when, why), and the difference between any two. */
export function RuleHistoryPage({ ruleId, zones, recipients }: { ruleId: number; zones: readonly ZoneOption[]; recipients: RecipientOptions }) {
  const rule = useRule(ruleId);
  const versions = useRuleVersions(ruleId);
  const [search, setSearch] = useSearchParams();
  const pair = versions.data ? chosenPair(versions.data, search) : null;
  const choose = (side: "from" | "to", version: number) => {
    const next = new URLSearchParams(search);
    next.set(side, String(version));
    if (pair) next.set(side === "from" ? "to" : "from", String(side === "from" ? pair.to.version : pair.from.version));
    setSearch(next, { replace: true });
  };

  return (
    <>
      <PageHeader
        title={rule.data ? `History of ${rule.data.name}` : "Rule history"}
        description={versions.data ? `${formatCount(versions.data.length, "version")}; every save is kept and never changed.` : undefined}
        actions={
          <Link to={rulePaths.detail(ruleId)} className="inline-flex h-9 items-center rounded border border-line bg-raised px-3.5 text-sm font-medium hover:border-muted">
            Open the rule
          </Link>
        }
      />
      {versions.isPending && <Loading label="Loading versions…" />}
      {versions.isError && (
        <Notice tone="danger" title="Could not load the versions">
          {describeError(versions.error).message}
        </Notice>
      )}
      {versions.data && (
        <div className="flex flex-col gap-4">
          <SectionBoundary label="the version list">
            <VersionTable versions={versions.data} pair={pair} onChoose={choose} />
          </SectionBoundary>
          <SectionBoundary label="the differences">
            {pair ? (
              <Panel title={`Changes from version ${pair.from.version} to version ${pair.to.version}`}>
                <VersionDiffView changes={diffDefinitions(pair.from.definition, pair.to.definition, zoneLabelFor(zones), recipientNamesFor(recipients))} />
              </Panel>
            ) : (
              <Notice title="Only one version so far">Differences appear once the rule has been saved again.</Notice>
            )}
          </SectionBoundary>
        </div>
      )}
    </>
  );
}

function VersionTable({
  versions,
  pair,
  onChoose,
}: {
  versions: readonly RuleVersionDto[];
  pair: { from: RuleVersionDto; to: RuleVersionDto } | null;
  onChoose: (side: "from" | "to", version: number) => void;
}) {
  return (
    <div className="overflow-x-auto rounded-md border border-line bg-surface">
      <table className="w-full text-left">
        <caption className="sr-only">Versions, newest first</caption>
        <thead className="border-b border-line bg-raised text-xs text-muted">
          <tr>
            <th scope="col" className="px-3 py-2 font-medium">Version</th>
            <th scope="col" className="px-3 py-2 font-medium">Saved by</th>
            <th scope="col" className="px-3 py-2 font-medium">When</th>
            <th scope="col" className="px-3 py-2 font-medium">Note</th>
            {pair && <th scope="col" className="px-3 py-2 text-center font-medium">Compare from</th>}
            {pair && <th scope="col" className="px-3 py-2 text-center font-medium">to</th>}
          </tr>
        </thead>
        <tbody>
          {versions.map((v) => (
            <tr key={v.id} className="border-b border-line last:border-0">
              <td className="px-3 py-1.5 font-mono">v{v.version}</td>
              <td className="px-3 py-1.5">{v.createdBy ?? "the system"}</td>
              <td className="px-3 py-1.5">
                <Timestamp value={v.createdAt} />
              </td>
              <td className="px-3 py-1.5">{v.changeNote || <span className="text-muted">—</span>}</td>
              {pair && (
                <td className="px-3 py-1.5 text-center">
                  <input type="radio" name="compare-from" aria-label={`Compare from version ${v.version}`} checked={pair.from.id === v.id} onChange={() => onChoose("from", v.version)} />
                </td>
              )}
              {pair && (
                <td className="px-3 py-1.5 text-center">
                  <input type="radio" name="compare-to" aria-label={`Compare to version ${v.version}`} checked={pair.to.id === v.id} onChange={() => onChoose("to", v.version)} />
                </td>
              )}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
