import { useMemo } from "react";
import type { GridGeometry } from "@shared/grid/geometry-types.ts";
import { decodeMaskBits } from "@shared/grid/mask-bits.ts";
import type { ZoneGeometry } from "@shared/zones/zone-geometry.ts";
import { MapStage, MaskLayer, OutlinesLayer, ZoneOutlineLayer } from "@/components/map/index.ts";
import { formatNumber } from "@/lib/format-units.ts";
import { formatUtcCycle, formatUtcDateTime } from "@/lib/time.ts";
import type { BacktestDto } from "../api/rule-map-dtos.ts";
import type { ZoneOption } from "../editor/rule-editor-types.ts";

type BacktestFrame = BacktestDto["frames"][number];

/** What the trigger logic did with the frame, in one short word (the card's legend explains them). */
const DECISION_WORDS: Record<string, string> = { open: "opens", extend: "extends", retract: "retracts", none: "" };

/** One frame of a backtest: its valid time and run, a small map of the matched area in the rule's zones, and each zone's outcome. */
export function BacktestFrameCard({ frame, geometry, zones, outlines }: { frame: BacktestFrame; geometry: GridGeometry | null; zones: ReadonlyMap<number, ZoneOption>; outlines: readonly ZoneGeometry[] }) {
  const mask = useMemo(
    () => (frame.mask && geometry ? decodeMaskBits(frame.mask, geometry.nx * geometry.ny) : null),
    [frame.mask, geometry],
  );
  const anyMet = frame.zones.some((z) => z.met);
  const opens = frame.zones.filter((z) => z.decision === "open");
  return (
    <article
      aria-label={`Valid ${formatUtcDateTime(frame.frame.validTime)}, run ${formatUtcCycle(frame.frame.runTime)}`}
      className={`flex flex-col gap-1.5 rounded-md border bg-surface p-2 ${opens.length ? "border-accent/70" : "border-line"}`}
    >
      <header className="flex flex-col font-mono">
        <span className="text-xs font-medium">valid {formatUtcDateTime(frame.frame.validTime)}</span>
        <span className="text-[11px] text-muted">
          run {formatUtcCycle(frame.frame.runTime)} · F{String(frame.frame.forecastHour).padStart(2, "0")}
        </span>
      </header>
      {geometry && (
        <MapStage geometry={geometry} maxHeight={150}>
          <OutlinesLayer />
          <ZoneOutlineLayer zones={outlines} />
          {mask && <MaskLayer mask={mask} colour="#f2a7c4" label="matched area" />}
        </MapStage>
      )}
      {frame.missingFields.length > 0 && <p className="text-xs text-caution">No {frame.missingFields.join(", ")} on this frame: not checked.</p>}
      <ul className="flex flex-wrap gap-1" aria-label="Zones">
        {frame.zones.map((z) => (
          <li
            key={z.zoneId}
            title={z.reason}
            className={`rounded border px-1 py-px font-mono text-[11px] ${
              z.decision === "open" ? "border-accent bg-accent/20 text-accent" : z.met ? "border-ok/50 bg-ok/10 text-ok" : "border-line text-muted"
            }`}
          >
            {zones.get(z.zoneId)?.code ?? `#${z.zoneId}`} {z.met ? (z.coveragePercent === null ? "met" : `${formatNumber(z.coveragePercent, 0)}%`) : "—"}
            {DECISION_WORDS[z.decision] ? ` ${DECISION_WORDS[z.decision]}` : ""}
          </li>
        ))}
      </ul>
      {!anyMet && frame.missingFields.length === 0 && <p className="sr-only">Not met in any zone.</p>}
    </article>
  );
}
