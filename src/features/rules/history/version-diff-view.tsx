import type { DefinitionChange, WordDiffPart } from "./version-diff.ts";

function Words({ parts }: { parts: readonly WordDiffPart[] }) {
  return (
    <code className="block font-mono text-sm leading-7 break-words whitespace-pre-wrap">
      {parts.map((part, k) => {
        const gap = k > 0 ? " " : "";
        if (part.kind === "same") return <span key={k}>{`${gap}${part.text}`}</span>;
        const Tag = part.kind === "added" ? "ins" : "del";
        return (
          <span key={k}>
            {gap}
            <Tag
              className={part.kind === "added" ? "rounded-sm bg-ok/20 px-0.5 text-ok no-underline" : "rounded-sm bg-danger/15 px-0.5 text-danger line-through"}
              aria-label={`${part.kind === "added" ? "added" : "removed"}: ${part.text}`}
            >
              {part.text}
            </Tag>
          </span>
        );
      })}
    </code>
  );
}

/** The parts that differ between two versions: old value struck out, new value beside it; the expression word by word. */
export function VersionDiffView({ changes }: { changes: readonly DefinitionChange[] }) {
  if (changes.length === 0) return <p className="text-muted">These two versions read exactly alike.</p>;
  return (
    <dl className="grid grid-cols-[10rem_1fr] gap-x-4 gap-y-3" aria-label="Differences">
      {changes.map((change) => (
        <div key={change.key} className="contents">
          <dt className="text-xs font-medium text-muted">{change.label}</dt>
          <dd className="min-w-0">
            {change.words ? (
              <Words parts={change.words} />
            ) : change.added || change.removed ? (
              <span className="flex flex-wrap gap-x-3">
                {change.removed?.map((z) => (
                  <del key={z} className="text-danger">− {z}</del>
                ))}
                {change.added?.map((z) => (
                  <ins key={z} className="text-ok no-underline">+ {z}</ins>
                ))}
              </span>
            ) : (
              <span className="flex flex-wrap items-baseline gap-x-2">
                <del className="text-danger">{change.before}</del>
                <span aria-hidden="true" className="text-muted">→</span>
                <ins className="text-ok no-underline">{change.after}</ins>
              </span>
            )}
          </dd>
        </div>
      ))}
    </dl>
  );
}
