import type { AuditEntryDto } from "@shared/api/audit.ts";
import { changedTopLevelKeys, formatSnapshot } from "../json-changes.ts";

function Snapshot({ label, value }: { label: string; value: unknown }) {
  return (
    <figure className="min-w-0 flex-1">
      <figcaption className="mb-1 text-xs font-medium text-muted">{label}</figcaption>
      <pre className="max-h-80 overflow-auto rounded border border-line bg-canvas p-2.5 font-mono text-xs leading-relaxed">{formatSnapshot(value)}</pre>
    </figure>
  );
}

/** The before and after snapshots of one entry, with the keys that changed named first. */
export function AuditEntryDetail({ entry }: { entry: AuditEntryDto }) {
  const changed = changedTopLevelKeys(entry.before, entry.after);
  const hasSnapshots = entry.before != null || entry.after != null;
  return (
    <div className="flex flex-col gap-2 px-3 py-3">
      <p className="text-xs text-muted">
        {entry.actor ? `By ${entry.actor}` : "By the system"}
        {entry.actorRoles.length > 0 && ` (roles: ${entry.actorRoles.join(", ")})`}
        {changed.length > 0 && (
          <>
            {" · changed "}
            <span className="font-mono text-ink">{changed.join(", ")}</span>
          </>
        )}
      </p>
      {hasSnapshots ? (
        <div className="flex flex-col gap-3 md:flex-row">
          <Snapshot label="Before" value={entry.before} />
          <Snapshot label="After" value={entry.after} />
        </div>
      ) : (
        <p className="text-muted">This entry records an event only; no before or after state was kept.</p>
      )}
      <p className="font-mono text-[11px] break-all text-muted">
        Hash {entry.hash}
        {entry.requestId && ` · request ${entry.requestId}`}
      </p>
    </div>
  );
}
