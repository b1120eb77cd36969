import { useMemo, useReducer, useState } from "react";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { createZoneInput, type ZoneDto } from "@shared/api/zones.ts";
import { MapStage, OutlinesLayer, ZoneOutlineLayer } from "@/components/map/index.ts";
import { Button } from "@/components/ui/button.tsx";
import { Loading } from "@/components/ui/loading.tsx";
import { Notice } from "@/components/ui/notice.tsx";
import { Panel } from "@/components/ui/panel.tsx";
import { TextField } from "@/components/ui/text-field.tsx";
import { useToast } from "@/components/ui/toaster.tsx";
import { describeError } from "@/lib/describe-error.ts";
import { formatCount } from "@/lib/format-units.ts";
import { refusalProblems } from "@/lib/refusal-problems.ts";
import { formatUtcCycle, formatUtcDateTime } from "@/lib/time.ts";
import { useCreateZone } from "../../api/create-zone.ts";
import { useNewestFrame, type DrawingFrame } from "../../api/get-newest-frame.ts";
import { canClose, drawingGeometry, drawingProblems, drawingReducer, EMPTY_DRAWING, MIN_VERTICES, type LonLat } from "../../drawing/polygon-drawing.ts";
import { DrawingSurface } from "./drawing-surface.tsx";
import { DrawnPolygonLayer } from "./drawn-polygon-layer.tsx";

const nameForm = createZoneInput.pick({ code: true, name: true });

/** Drawing a new zone on the newest frame's grid, then naming and saving it. */
export function ZoneDrawPanel({ zones, onDone }: { zones: readonly ZoneDto[]; onDone: () => void }) {
  const frame = useNewestFrame();
  return (
    <Panel title="Draw a zone" actions={<Button size="sm" variant="ghost" onClick={onDone}>Close</Button>}>
      {frame.isPending && <Loading label="Loading the newest grid…" />}
      {frame.isError && (
        <Notice tone="danger" title="Could not load the newest grid">
          {describeError(frame.error).message}
        </Notice>
      )}
      {frame.data === null && (
        <Notice title="No grid to draw on yet">Zones are drawn over the newest model frame, and none has arrived. Import a GeoJSON file instead.</Notice>
      )}
      {frame.data && <DrawingWorkspace frame={frame.data} zones={zones} onDone={onDone} />}
    </Panel>
  );
}

function DrawingWorkspace({ frame, zones, onDone }: { frame: DrawingFrame; zones: readonly ZoneDto[]; onDone: () => void }) {
  const [state, dispatch] = useReducer(drawingReducer, EMPTY_DRAWING);
  const [pointer, setPointer] = useState<LonLat | null>(null);
  const problems = useMemo(() => drawingProblems(state), [state]);
  const outlines = useMemo(() => zones.map((z) => z.geometry), [zones]);
  const createZone = useCreateZone();
  const toast = useToast();
  const form = useForm({ resolver: zodResolver(nameForm), defaultValues: { code: "", name: "" } });
  const geometry = drawingGeometry(state);

  const save = form.handleSubmit((values) => {
    if (!geometry) return;
    createZone.mutate(
      { ...values, geometry },
      {
        onSuccess: (zone) => {
          toast.success(`Zone ${zone.code} saved`, zone.coversNothing ? "It covers no point of a stored grid." : `${zone.name}`);
          dispatch({ type: "clear" });
          form.reset();
          onDone();
        },
      },
    );
  });

  const status =
    state.vertices.length === 0
      ? "Click on the map to place the first corner."
      : state.closed
        ? `Closed with ${formatCount(state.vertices.length, "corner")}. Name it and save, or undo to keep drawing.`
        : state.vertices.length < MIN_VERTICES
          ? `${formatCount(state.vertices.length, "corner")}; at least ${MIN_VERTICES} are needed.`
          : `${formatCount(state.vertices.length, "corner")}. Double-click the last corner or press Enter to close the ring.`;

  return (
    <div className="flex flex-col gap-4 lg:flex-row">
      <div className="min-w-0 flex-1">
        <MapStage geometry={frame.geometry} maxHeight={520}>
          <OutlinesLayer />
          <ZoneOutlineLayer zones={outlines} />
          <DrawnPolygonLayer vertices={state.vertices} closed={state.closed} pointer={state.closed ? null : pointer} hasProblems={problems.length > 0} />
          <DrawingSurface
            label="Zone drawing map. Click to add a corner, double-click or press Enter to close, Backspace to undo. Arrow keys move a cursor; Space adds a corner there."
            onAdd={(v) => dispatch({ type: "add", lon: v[0], lat: v[1] })}
            onClose={() => dispatch({ type: "close" })}
            onUndo={() => dispatch({ type: "undo" })}
            onPointer={setPointer}
          />
        </MapStage>
        <p className="mt-1 font-mono text-xs text-muted">
          Grid of {frame.model}, run {formatUtcCycle(frame.runTime)}, valid {formatUtcDateTime(frame.validTime)}. Dashed lines: existing zones.
        </p>
      </div>
      <div className="flex w-full shrink-0 flex-col gap-3 lg:w-80">
        <p aria-live="polite">{status}</p>
        {problems.length > 0 && (
          <Notice tone="danger" title="This ring would be refused">
            <ul className="list-disc pl-5">
              {problems.map((p) => (
                <li key={p}>{p}</li>
              ))}
            </ul>
          </Notice>
        )}
        <div className="flex flex-wrap gap-2">
          <Button size="sm" onClick={() => dispatch({ type: "undo" })} disabled={state.vertices.length === 0}>
            Undo
          </Button>
          <Button size="sm" onClick={() => dispatch({ type: "close" })} disabled={!canClose(state)}>
            Close ring
          </Button>
          <Button size="sm" variant="ghost" onClick={() => dispatch({ type: "clear" })} disabled={state.vertices.length === 0}>
            Start again
          </Button>
        </div>
        <form onSubmit={save} noValidate className="flex flex-col gap-2">
          <TextField label="Code" mono autoComplete="off" error={form.formState.errors.code?.message} {...form.register("code")} />
          <TextField label="Name" autoComplete="off" error={form.formState.errors.name?.message} {...form.register("name")} />
          {createZone.error != null && (
            <Notice tone="danger" title="The zone was not saved">
              <ul className="list-disc pl-5">
                {refusalProblems(createZone.error).map((p) => (
                  <li key={p}>{p}</li>
                ))}
              </ul>
            </Notice>
          )}
          <Button type="submit" variant="primary" disabled={!geometry || createZone.isPending}>
            {createZone.isPending ? "Saving…" : "Save zone"}
          </Button>
        </form>
      </div>
    </div>
  );
}
