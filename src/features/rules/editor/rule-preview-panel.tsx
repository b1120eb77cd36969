import { useMemo } from "react";
import { spatialConditionSchema, type PreviewInput } from "@shared/api/rules.ts";
import { decodeMaskBits } from "@shared/grid/mask-bits.ts";
import { MapStage, MaskLayer, maskCount, OutlinesLayer, ZoneOutlineLayer } from "@/components/map/index.ts";
import { Notice } from "@/components/ui/notice.tsx";
import { Panel } from "@/components/ui/panel.tsx";
import { useDebouncedValue } from "@/hooks/use-debounced-value.ts";
import { isApiError } from "@/lib/api-client.ts";
import { describeError } from "@/lib/describe-error.ts";
import { formatCount, formatNumber } from "@/lib/format-units.ts";
import { formatUtcCycle, formatUtcDateTime } from "@/lib/time.ts";
import { useRulePreview } from "../api/preview-rule.ts";
import type { PreviewDto } from "../api/rule-map-dtos.ts";
import type { ZoneOption } from "./rule-editor-types.ts";
import type { RuleFormInput } from "./rule-form-values.ts";

/** Long enough that typing a number does not send a preview per digit; short enough to feel live. */
const PREVIEW_DELAY_MS = 600;
const MASK_COLOUR = "#f2a7c4";

/**
 * The editor's live preview: where the expression (saved or not) matches on the newest stored
 * frame, inside the chosen zones, with matched points and coverage per zone and whether the spatial
 * condition holds. Asked for only while the expression passes its checks.
 */
export function RulePreviewPanel({
  expression,
  expressionOk,
  zoneIds,
  spatialCondition,
  zones,
}: {
  expression: string;
  expressionOk: boolean;
  zoneIds: readonly number[];
  spatialCondition: RuleFormInput["spatialCondition"];
  zones: readonly ZoneOption[];
}) {
  // A half-typed condition (an empty number) previews as "any point" rather than failing.
  const condition = spatialConditionSchema.safeParse(spatialCondition);
  const wanted: PreviewInput | null = expressionOk
    ? { expression, zoneIds: [...zoneIds], spatialCondition: condition.success ? condition.data : { kind: "any-point" } }
    : null;
  const input = useDebouncedValue(wanted, PREVIEW_DELAY_MS);
  const preview = useRulePreview(input);
  const settling = JSON.stringify(wanted) !== JSON.stringify(input) || preview.isFetching;

  return (
    <Panel title="Preview on the newest frame" actions={settling && input ? <span className="text-xs text-muted">Updating…</span> : undefined}>
      {!expressionOk && <p className="text-muted">The map appears once the expression passes its checks.</p>}
      {expressionOk && preview.isPending && <p className="text-muted">Checking the newest frame…</p>}
      {expressionOk && preview.isError && !preview.data && (
        <Notice tone={isApiError(preview.error) && preview.error.status === 404 ? "neutral" : "danger"} title="No preview">
          {isApiError(preview.error) && preview.error.status === 404 ? "No model frame is stored yet, so there is nothing to preview on." : describeError(preview.error).message}
        </Notice>
      )}
      {expressionOk && preview.data && <PreviewResult preview={preview.data} zones={zones} />}
    </Panel>
  );
}

function PreviewResult({ preview, zones }: { preview: PreviewDto; zones: readonly ZoneOption[] }) {
  const { geometry, frame } = preview;
  const mask = useMemo(() => (preview.mask ? decodeMaskBits(preview.mask, geometry.nx * geometry.ny) : null), [preview.mask, geometry.nx, geometry.ny]);
  const matched = mask ? maskCount(mask) : 0;
  const zoneById = new Map(zones.map((z) => [z.id, z]));
  const outlines = useMemo(() => preview.zones.map((z) => zoneById.get(z.zoneId)?.geometry).filter((g) => g !== undefined), [preview.zones, zones]);
  const total = geometry.nx * geometry.ny;
  return (
    <div className="flex flex-col gap-2">
      <p className="font-mono text-xs text-muted">
        {frame.model} · run {formatUtcCycle(frame.runTime)} · F{String(frame.forecastHour).padStart(2, "0")} valid {formatUtcDateTime(frame.validTime)}
      </p>
      {preview.missingFields.length > 0 && (
        <Notice tone="caution" title="This frame lacks a field the rule reads">
          No {preview.missingFields.join(", ")} on this frame, so nothing could be checked.
        </Notice>
      )}
      <MapStage geometry={geometry} maxHeight={340}>
        <OutlinesLayer />
        {outlines.length > 0 && <ZoneOutlineLayer zones={outlines} />}
        {mask && <MaskLayer mask={mask} colour={MASK_COLOUR} label="matched area" />}
      </MapStage>
      {mask && (
        <p data-testid="preview-summary">
          Matches {formatCount(matched, "grid point")} of {formatNumber(total)} ({formatNumber((100 * matched) / total, 1)} %) on the whole grid.
        </p>
      )}
      {preview.zones.length > 0 && (
        <table className="w-full text-left text-xs">
          <caption className="sr-only">Matches per zone</caption>
          <thead className="text-muted">
            <tr>
              <th scope="col" className="py-1 font-medium">Zone</th>
              <th scope="col" className="py-1 text-right font-medium">Matched</th>
              <th scope="col" className="py-1 text-right font-medium">Coverage</th>
              <th scope="col" className="py-1 pl-3 font-medium">Condition</th>
            </tr>
          </thead>
          <tbody>
            {preview.zones.map((z) => (
              <tr key={z.zoneId} className="border-t border-line" title={z.reason}>
                <td className="py-1 font-mono">{zoneById.get(z.zoneId)?.code ?? `#${z.zoneId}`}</td>
                <td className="py-1 text-right font-mono tabular-nums">
                  {formatNumber(z.summary.matchedPoints)} / {formatNumber(z.summary.zonePoints)}
                </td>
                <td className="py-1 text-right font-mono tabular-nums">{z.summary.coveragePercent === null ? "—" : `${formatNumber(z.summary.coveragePercent, 1)} %`}</td>
                <td className={`py-1 pl-3 ${z.met ? "font-medium text-ok" : "text-muted"}`}>{z.met ? "Met" : "Not met"}</td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
      <p className="text-xs text-muted">Hatched: where the expression holds. Dashed: the chosen zones. Persistence and cool-down are not applied here; the backtest applies them.</p>
    </div>
  );
}
