import type { ReactNode } from "react";
import { Link } from "react-router-dom";
import type { TriggerSummaryDto } from "@shared/api/triggers.ts";
import { paths, triggerPath } from "@/config/paths.ts";
import { formatCount } from "@/lib/format-units.ts";
import type { KnownTimelineEntry, OtherTimelineEntry } from "../timeline/timeline-rows.ts";
import { formatDayHeading } from "../timeline/trigger-labels.ts";
import { UtcLocalTime } from "./utc-local-time.tsx";

/** Heights in CSS pixels, known up front for the windowed list. */
export const DAY_ROW_HEIGHT = 34;
export const LIGHT_ROW_HEIGHT = 28;

/** A UTC day's heading, with the stretch of local time it covers beside it. */
export function DayHeadingRow({ day, count }: { day: string; count: number }) {
  const heading = formatDayHeading(day);
  return (
    <div className="flex h-full items-end gap-3 border-b border-line bg-canvas px-3 pb-1">
      <h2 className="text-xs font-semibold tracking-wide text-ink uppercase">{heading.utc} UTC</h2>
      <span className="text-xs text-muted">local {heading.local}</span>
      <span className="ml-auto text-xs text-muted">{formatCount(count, "entry", "entries")}</span>
    </div>
  );
}

function LightRow({ time, selected, children }: { time: string; selected?: boolean; children: ReactNode }) {
  return (
    <div
      aria-current={selected ? "true" : undefined}
      className={`flex h-full min-w-0 items-center gap-2 border-b border-line/60 pr-3 pl-4 text-xs text-muted ${selected ? "bg-raised outline-2 -outline-offset-2 outline-focus" : ""}`}
    >
      {children}
      <span className="ml-auto shrink-0">
        <UtcLocalTime value={time} />
      </span>
    </div>
  );
}

/** A grid file that finished arriving (or failed to). */
export function GridEntryRow({ entry }: { entry: Extract<KnownTimelineEntry, { kind: "grid" }> }) {
  const failed = entry.state === "failed";
  return (
    <LightRow time={entry.at}>
      <span aria-hidden="true">{failed ? "⚠" : "▦"}</span>
      <span className="shrink-0">{failed ? "Grid failed" : "Grid arrived"}</span>
      <Link to={paths.grids} className="min-w-0 truncate font-mono text-ink hover:underline">
        {entry.name}
      </Link>
      <span className={`min-w-0 truncate ${failed ? "text-danger" : ""}`}>{failed ? (entry.reason ?? "no reason given") : formatCount(entry.frameCount, "frame")}</span>
    </LightRow>
  );
}

/** Nobody acknowledged a trigger in time and it was escalated. */
export function EscalationEntryRow({
  entry,
  trigger,
  selected,
  onSelect,
}: {
  entry: Extract<KnownTimelineEntry, { kind: "escalation" }>;
  trigger: TriggerSummaryDto | undefined;
  selected: boolean;
  onSelect: () => void;
}) {
  return (
    <div className="h-full" onClick={onSelect}>
      <LightRow time={entry.at} selected={selected}>
        <span aria-hidden="true" className="text-caution">
          ⇡
        </span>
        <span className="shrink-0 text-caution">Escalated</span>
        <Link to={triggerPath(entry.triggerId)} className="min-w-0 truncate text-ink hover:underline" onClick={(event) => event.stopPropagation()}>
          {trigger ? `${trigger.rule.name} · ${trigger.zone.code}` : `trigger ${entry.triggerId}`}
        </Link>
        {entry.note && <span className="min-w-0 truncate">{entry.note}</span>}
      </LightRow>
    </div>
  );
}

/** An entry of a kind this screen has no layout for (the server added it later): its kind and a few words. */
export function OtherEntryRow({ entry }: { entry: OtherTimelineEntry }) {
  return (
    <LightRow time={entry.at}>
      <span aria-hidden="true">•</span>
      <span className="shrink-0 capitalize">{entry.serverKind.replaceAll(/[-_]/g, " ")}</span>
      {entry.text && <span className="min-w-0 truncate text-ink">{entry.text}</span>}
    </LightRow>
  );
}
