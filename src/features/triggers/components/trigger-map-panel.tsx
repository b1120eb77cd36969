import { useMemo, useState } from "react";
import { Link, useNavigate, useSearchParams } from "react-router-dom";
import type { TriggerDetailDto } from "@shared/api/triggers.ts";
import { projectionForGeometry } from "@shared/grid/projection.ts";
import { zoneGeometrySchema } from "@shared/zones/zone-geometry.ts";
import {
  chooseColourScale,
  describeMapField,
  FieldPicker,
  FieldRasterLayer,
  formatLatLon,
  formatMapValue,
  groupMapFields,
  MapLegend,
  MapPointerSurface,
  MapReadout,
  MapStage,
  MaskLayer,
  OutlinesLayer,
  PointMarkerLayer,
  useFieldValues,
  ZoneOutlineLayer,
  type MapPoint,
} from "@/components/map/index.ts";
import { Loading } from "@/components/ui/loading.tsx";
import { Notice } from "@/components/ui/notice.tsx";
import { Panel } from "@/components/ui/panel.tsx";
import { soundingLinkForPoint } from "@/config/paths.ts";
import { describeError } from "@/lib/describe-error.ts";
import { formatCount } from "@/lib/format-units.ts";
import { formatUtcTime } from "@/lib/time.ts";
import { useTriggerMask } from "../api/get-trigger-mask.ts";
import { defaultFrameId, expressionFields, expressionOf, framesOfTrigger } from "../detail/trigger-frames.ts";
import { finiteRange, maxInsideMask } from "../detail/worst-point.ts";
import { formatCoverage, formatRunLabel } from "../timeline/trigger-labels.ts";

const forecastHourLabel = (runTime: string, validTime: string) => `F${String(Math.round((Date.parse(validTime) - Date.parse(runTime)) / 3_600_000)).padStart(2, "0")}`;

/**
 * The matched area of one frame over the field that fired, with the zone's outline, coasts and
 * borders, and a ring at the strongest point of the area (which opens the sounding there). The
 * frame and field are chosen here and kept in the URL (`?frame=12&field=mlcape`).
 */
export function TriggerMapPanel({ trigger }: { trigger: TriggerDetailDto }) {
  const [search, setSearch] = useSearchParams();
  const navigate = useNavigate();
  const frames = useMemo(() => framesOfTrigger(trigger.frames), [trigger.frames]);
  const fields = useMemo(() => {
    const fromExpression = expressionFields(expressionOf(trigger));
    return fromExpression.length ? fromExpression : [...new Set(frames.flatMap((frame) => frame.fields.map((f) => f.key)))];
  }, [trigger, frames]);
  const askedFrame = Number(search.get("frame"));
  const frameId = frames.some((frame) => frame.frameId === askedFrame) ? askedFrame : defaultFrameId(frames);
  const askedField = search.get("field");
  const fieldKey = askedField && fields.includes(askedField) ? askedField : (fields[0] ?? null);
  const frame = frames.find((f) => f.frameId === frameId) ?? null;

  const mask = useTriggerMask(trigger.id, frameId);
  const geometry = mask.data?.geometry ?? null;
  const values = useFieldValues(frameId ?? 0, fieldKey, geometry);
  const field = useMemo(() => (fieldKey ? describeMapField({ key: fieldKey, unit: "1" }) : null), [fieldKey]);
  const scale = useMemo(() => (field && values.data ? chooseColourScale(field, finiteRange(values.data.values)) : null), [field, values.data]);
  const zone = useMemo(() => {
    const parsed = zoneGeometrySchema.safeParse(trigger.zoneGeometry);
    return parsed.success ? [parsed.data] : [];
  }, [trigger.zoneGeometry]);
  const [point, setPoint] = useState<MapPoint | null>(null);

  const worst = useMemo(() => {
    if (!geometry || !mask.data?.mask || !values.data) return null;
    const index = maxInsideMask(values.data.values, mask.data.mask);
    if (index < 0) return null;
    const i = index % geometry.nx;
    const j = Math.floor(index / geometry.nx);
    const at = projectionForGeometry(geometry).gridToLatLon(i, j, { lat: 0, lon: 0 });
    return { i, j, lat: at.lat, lon: at.lon, value: values.data.values[index]! };
  }, [geometry, mask.data, values.data]);

  const update = (name: "frame" | "field", value: string) => {
    const next = new URLSearchParams(search);
    next.set(name, value);
    setSearch(next, { replace: true });
  };

  if (frames.length === 0 || frameId === null) {
    return (
      <Panel title="Matched area">
        <p className="text-muted">No frame has been checked for this trigger yet.</p>
      </Panel>
    );
  }

  return (
    <Panel title="Matched area">
      <div className="mb-3 flex flex-wrap items-start gap-3">
        <label className="flex flex-col gap-1">
          <span className="text-xs font-medium text-muted">Frame</span>
          <select value={frameId} onChange={(event) => update("frame", event.target.value)} className="h-9 rounded border border-line bg-canvas px-2 font-mono text-sm text-ink">
            {frames.map((f) => (
              <option key={f.frameId} value={f.frameId}>
                {forecastHourLabel(f.runTime, f.validTime)} · valid {formatUtcTime(f.validTime)} · {formatRunLabel(f.runTime)} · {f.met ? `met, ${formatCoverage(f.coveragePercent)}` : "not met"}
              </option>
            ))}
          </select>
        </label>
        {fieldKey && (
          <div className="min-w-56">
            <FieldPicker groups={groupMapFields(fields.map((key) => ({ key, unit: "1" })))} value={fieldKey} onChange={(key) => update("field", key)} />
          </div>
        )}
      </div>
      {mask.isPending && <Loading label="Loading the matched area…" />}
      {mask.isError && (
        <Notice tone="danger" title="The matched area could not be loaded">
          {describeError(mask.error).message}
        </Notice>
      )}
      {mask.data && mask.data.missingFields.length > 0 && (
        <Notice tone="caution" title="The rule could not be checked on this frame">
          The frame has no {mask.data.missingFields.join(", ")} field.
        </Notice>
      )}
      {geometry && (
        <MapStage geometry={geometry} maxHeight={480}>
          {values.data && scale && <FieldRasterLayer field={values.data} scale={scale} />}
          <OutlinesLayer />
          {zone.length > 0 && <ZoneOutlineLayer zones={zone} />}
          {mask.data?.mask && <MaskLayer mask={mask.data.mask} label="matched area" />}
          {worst && <PointMarkerLayer i={worst.i} j={worst.j} label="strongest point" />}
          <MapPointerSurface
            label={`Map of ${fieldKey ?? "the frame"} with the matched area hatched. Point or use the arrow keys to read values; click or press Enter to open the sounding there.`}
            onPoint={setPoint}
            onPick={(p) => navigate(soundingLinkForPoint(frameId, p.lat, p.lon))}
          />
        </MapStage>
      )}
      {values.isError && (
        <Notice tone="danger" title={`Could not load ${fieldKey}`}>
          {describeError(values.error).message}
        </Notice>
      )}
      <div className="mt-2 flex flex-col gap-2">
        <MapReadout field={field} values={values.data ?? null} point={point} />
        <p className="flex flex-wrap items-center gap-x-4 gap-y-1 text-xs text-muted">
          <span className="flex items-center gap-1.5">
            <span aria-hidden="true" className="inline-block h-3 w-5 border border-white/80 bg-[repeating-linear-gradient(135deg,rgba(255,255,255,0.8)_0_1px,transparent_1px_5px)]" />
            matched area{frame ? ` (${formatCount(frame.matchedPoints, "point")} of ${formatCount(frame.zonePoints, "zone point")})` : ""}
          </span>
          <span className="flex items-center gap-1.5">
            <span aria-hidden="true" className="inline-block h-0 w-5 border-t-2 border-dashed border-[#f2d38a]" />
            zone outline
          </span>
          <span className="flex items-center gap-1.5">
            <span aria-hidden="true" className="inline-block h-3 w-3 rounded-full border-2 border-white" />
            strongest point
          </span>
        </p>
        {worst && field && (
          <p className="text-sm">
            <Link to={soundingLinkForPoint(frameId, worst.lat, worst.lon)} className="text-accent underline-offset-2 hover:underline">
              Sounding at the strongest point
            </Link>
            <span className="text-muted">
              {" "}
              ({field.key} {formatMapValue(field, worst.value)} at {formatLatLon(worst.lat, worst.lon)})
            </span>
          </p>
        )}
        {field && scale && <MapLegend field={field} scale={scale} missingCount={0} />}
      </div>
    </Panel>
  );
}
