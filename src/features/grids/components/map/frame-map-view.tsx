import { Fragment, useMemo, useState } from "react";
import { useNavigate, useSearchParams } from "react-router-dom";
import type { FieldInfoDto } from "@shared/api/grids.ts";
import { gridFramePath, soundingLinkForPoint } from "@/config/paths.ts";
import {
  chooseColourScale,
  defaultFieldKey,
  describeMapField,
  FieldPicker,
  FieldRasterLayer,
  formatMapValue,
  groupMapFields,
  MapLegend,
  MapPointerSurface,
  MapReadout,
  MapStage,
  unionRange,
  useFieldValues,
  type MapPoint,
} from "@/components/map/index.ts";
import { Loading } from "@/components/ui/loading.tsx";
import { Notice } from "@/components/ui/notice.tsx";
import { Panel } from "@/components/ui/panel.tsx";
import { describeError } from "@/lib/describe-error.ts";
import { formatNumber } from "@/lib/format-units.ts";
import { useFrames, type MapFrame } from "../../api/get-frame.ts";
import { useRuns } from "../../api/get-runs.ts";
import { useFrameStepKeys } from "../../hooks/use-frame-step-keys.ts";
import { mapViewFromSearch, searchFromMapView, type MapViewSettings } from "../../map-view-params.ts";
import { FrameStepper, neighbourFrames } from "./frame-stepper.tsx";
import { GridFacts } from "./grid-facts.tsx";
import { defaultOverlays, MAP_OVERLAYS, type OverlayContext } from "./map-overlays.tsx";
import { OverlayGroupLegends, OverlayToggles } from "./overlay-toggles.tsx";


/** The field's range over every frame of the run that is loaded, so colours mean the same at every valid time. */
function useRunRange(frame: MapFrame, fieldKey: string | null) {
  const runs = useRuns();
  const runFrames = runs.data?.find((run) => run.id === frame.runId)?.frames ?? [frame];
  const details = useFrames(runFrames.map((f) => f.id));
  const infos: FieldInfoDto[] = [];
  for (const detail of [frame, ...details.map((query) => query.data)]) {
    const info = detail?.fields.find((f) => f.key === fieldKey);
    if (info) infos.push(info);
  }
  return { runFrames, range: unionRange(infos) };
}

/** The map viewer for one loaded frame: field picker, map with overlays, legend, readout and stepper. */
export function FrameMapView({ frame }: { frame: MapFrame }) {
  const [search, setSearch] = useSearchParams();
  const navigate = useNavigate();
  const defaults = defaultOverlays();
  const settings = mapViewFromSearch(
    search,
    defaults,
    MAP_OVERLAYS.map((overlay) => overlay.id),
  );
  const groups = useMemo(() => groupMapFields(frame.fields), [frame.fields]);
  const fieldKey = settings.field && frame.fields.some((f) => f.key === settings.field) ? settings.field : defaultFieldKey(frame.fields);
  const info = frame.fields.find((f) => f.key === fieldKey) ?? null;
  const field = useMemo(() => (info ? describeMapField(info) : null), [info]);
  const { runFrames, range } = useRunRange(frame, fieldKey);
  const scale = useMemo(() => (field ? chooseColourScale(field, range) : null), [field, range.min, range.max]);
  const values = useFieldValues(frame.id, fieldKey, frame.geometry);
  const [point, setPoint] = useState<MapPoint | null>(null);

  const update = (next: Partial<MapViewSettings>) => setSearch(searchFromMapView({ ...settings, field: fieldKey, ...next }, defaults), { replace: true });
  const linkTo = (frameId: number) => gridFramePath(frameId, search.toString());
  const { previous, next } = neighbourFrames(runFrames, frame.id);
  useFrameStepKeys((direction) => {
    const target = direction < 0 ? previous : next;
    if (target) navigate(linkTo(target.id));
  });

  const overlayContext: OverlayContext = { frame, field, values: values.data ?? null, scale };
  const visibleOverlays = MAP_OVERLAYS.filter((overlay) => settings.overlays.includes(overlay.id) && !overlay.unavailableReason?.(overlayContext));
  const mapLabel = field
    ? `Map of ${field.key}. Point or use the arrow keys to read values; click or press Enter to open the sounding there.`
    : "Map of the frame";

  return (
    <div className="flex flex-col gap-4 xl:flex-row">
      <div className="flex min-w-0 flex-1 flex-col gap-2">
        <FrameStepper frames={runFrames} frameId={frame.id} linkTo={linkTo} />
        <MapStage geometry={frame.geometry} maxHeight={Math.max(320, window.innerHeight - 260)}>
          {values.data && scale && <FieldRasterLayer field={values.data} scale={scale} />}
          {visibleOverlays.map((overlay) => (
            <Fragment key={overlay.id}>{overlay.render(overlayContext)}</Fragment>
          ))}
          {visibleOverlays.map((overlay) => overlay.labels && <Fragment key={`${overlay.id}-labels`}>{overlay.labels(overlayContext)}</Fragment>)}
          <MapPointerSurface label={mapLabel} onPoint={setPoint} onPick={(p) => navigate(soundingLinkForPoint(frame.id, p.lat, p.lon))} />
        </MapStage>
        {values.isPending && fieldKey && <Loading label={`Loading ${fieldKey}…`} />}
        {values.isError && (
          <Notice tone="danger" title={`Could not load ${fieldKey}`}>
            {describeError(values.error).message}
          </Notice>
        )}
        <MapReadout field={field} values={values.data ?? null} point={point} />
        {field && scale && <MapLegend field={field} scale={scale} missingCount={info?.nanCount ?? 0} />}
        <OverlayGroupLegends context={overlayContext} selected={settings.overlays} />
      </div>

      <aside className="flex w-full shrink-0 flex-col gap-3 xl:w-80">
        <Panel title="Field" headingLevel={2}>
          {fieldKey ? (
            <>
              <FieldPicker groups={groups} value={fieldKey} onChange={(key) => update({ field: key })} />
              {field && info && (
                <p className="font-mono text-xs text-muted tabular-nums">
                  This frame: {formatMapValue(field, info.min ?? Number.NaN)} to {formatMapValue(field, info.max ?? Number.NaN)}
                  {info.nanCount > 0 && ` · ${formatNumber(info.nanCount)} without value`}
                </p>
              )}
            </>
          ) : (
            <p className="text-muted">This frame has no stored fields.</p>
          )}
        </Panel>
        <Panel title="Layers">
          <OverlayToggles context={overlayContext} selected={settings.overlays} onChange={(overlays) => update({ overlays })} />
        </Panel>
        <GridFacts frame={frame} />
      </aside>
    </div>
  );
}
