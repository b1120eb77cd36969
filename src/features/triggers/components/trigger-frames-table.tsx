import type { TriggerFrameDto } from "@shared/api/triggers.ts";
import { fieldByKey } from "@shared/fields.ts";
import { Panel } from "@/components/ui/panel.tsx";
import { formatFieldValue, formatNumber } from "@/lib/format-units.ts";
import { formatLocalBeside, formatUtcTime } from "@/lib/time.ts";
import { formatCoverage, formatRunLabel } from "../timeline/trigger-labels.ts";

/** A stored value in the field's display unit ("2,450"), or the raw number for a field outside the catalogue. */
function shown(key: string, value: number | null): string {
  const field = fieldByKey(key);
  return field ? formatFieldValue(field, value) : formatNumber(value, 2);
}

/**
 * The values that met the rule, frame by frame: matched points, coverage of the zone, and each
 * field's maximum and mean over the matched points, in display units. Choosing a row shows that
 * frame on the map.
 */
export function TriggerFramesTable({ frames, fieldKeys, selectedFrameId, onSelect }: { frames: readonly TriggerFrameDto[]; fieldKeys: readonly string[]; selectedFrameId: number | null; onSelect: (frameId: number) => void }) {
  return (
    <Panel title="Values per frame">
      <div className="overflow-x-auto">
        <table className="w-full text-xs">
          <caption className="sr-only">Per frame: whether the rule was met, how much of the zone, and the field values over the matched points</caption>
          <thead className="text-left text-muted">
            <tr className="border-b border-line">
              <th className="py-1 pr-3 font-medium">Valid (UTC · local)</th>
              <th className="py-1 pr-3 font-medium">Run</th>
              <th className="py-1 pr-3 font-medium">Met</th>
              <th className="py-1 pr-3 text-right font-medium">Matched points</th>
              <th className="py-1 pr-3 text-right font-medium">Coverage</th>
              {fieldKeys.map((key) => {
                const unit = fieldByKey(key)?.display.unit;
                return (
                  <th key={key} className="py-1 pr-3 text-right font-medium">
                    <span className="font-mono">{key}</span> max / mean{unit ? ` (${unit})` : ""}
                  </th>
                );
              })}
            </tr>
          </thead>
          <tbody className="font-mono tabular-nums">
            {frames.map((frame) => {
              const selected = frame.frameId === selectedFrameId;
              return (
                <tr key={frame.evaluationId} className={`border-b border-line/60 last:border-0 ${selected ? "bg-raised" : ""}`}>
                  <td className="py-1 pr-3 whitespace-nowrap">
                    <button type="button" onClick={() => onSelect(frame.frameId)} className="text-left text-accent hover:underline" aria-pressed={selected} title="Show this frame on the map">
                      {formatUtcTime(frame.validTime)}
                    </button>
                    <span className="text-muted"> · {formatLocalBeside(frame.validTime)}</span>
                  </td>
                  <td className="py-1 pr-3 whitespace-nowrap text-muted">{formatRunLabel(frame.runTime)}</td>
                  <td className="py-1 pr-3 font-sans" title={frame.reason}>
                    {frame.met ? <span className="text-caution">met</span> : <span className="text-muted">not met</span>}
                  </td>
                  <td className="py-1 pr-3 text-right">
                    {formatNumber(frame.matchedPoints)} <span className="text-muted">/ {formatNumber(frame.zonePoints)}</span>
                  </td>
                  <td className="py-1 pr-3 text-right">{formatCoverage(frame.coveragePercent)}</td>
                  {fieldKeys.map((key) => {
                    const peak = frame.fields.find((f) => f.key === key);
                    return (
                      <td key={key} className="py-1 pr-3 text-right whitespace-nowrap">
                        {peak ? (
                          <>
                            {shown(key, peak.max)} <span className="text-muted">/ {shown(key, peak.mean)}</span>
                          </>
                        ) : (
                          <span className="text-muted">—</span>
                        )}
                      </td>
                    );
                  })}
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>
    </Panel>
  );
}
