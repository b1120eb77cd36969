import { useEffect, useRef } from "react";
import { MAP_OVERLAY_GROUPS, MAP_OVERLAYS, type MapOverlay, type MapOverlayGroup, type OverlayContext } from "./map-overlays.tsx";

function OverlayToggle({ overlay, context, selected, onChange }: { overlay: MapOverlay; context: OverlayContext; selected: readonly string[]; onChange: (next: readonly string[]) => void }) {
  const reason = overlay.unavailableReason?.(context) ?? null;
  const checked = selected.includes(overlay.id);
  return (
    <label className="flex items-center gap-2">
      <input
        type="checkbox"
        checked={checked}
        disabled={reason !== null}
        onChange={() => onChange(checked ? selected.filter((id) => id !== overlay.id) : [...selected, overlay.id])}
      />
      <span className={reason ? "text-muted" : ""}>{overlay.label}</span>
      {reason && <span className="text-xs text-muted">({reason})</span>}
    </label>
  );
}

/** A group's heading doubles as a switch for all of its overlays (half-set while only some are on). */
function GroupToggles({ group, context, selected, onChange }: { group: MapOverlayGroup; context: OverlayContext; selected: readonly string[]; onChange: (next: readonly string[]) => void }) {
  const members = MAP_OVERLAYS.filter((overlay) => overlay.group === group.id);
  const usable = members.filter((overlay) => !overlay.unavailableReason?.(context));
  const onCount = usable.filter((overlay) => selected.includes(overlay.id)).length;
  const all = usable.length > 0 && onCount === usable.length;
  const box = useRef<HTMLInputElement>(null);
  useEffect(() => {
    if (box.current) box.current.indeterminate = onCount > 0 && !all;
  }, [onCount, all]);
  const memberIds = new Set(usable.map((overlay) => overlay.id));
  const toggleAll = () => onChange(all ? selected.filter((id) => !memberIds.has(id)) : [...selected.filter((id) => !memberIds.has(id)), ...memberIds]);
  return (
    <fieldset className="mt-1 flex flex-col gap-1.5">
      <legend className="mb-1">
        <label className="flex items-center gap-2 font-medium">
          <input ref={box} type="checkbox" checked={all} disabled={usable.length === 0} onChange={toggleAll} />
          {group.label}
          <span className="text-xs font-normal text-muted">(all {members.length})</span>
        </label>
      </legend>
      <div className="flex flex-col gap-1.5 border-l border-line pl-3">
        {members.map((overlay) => (
          <OverlayToggle key={overlay.id} overlay={overlay} context={context} selected={selected} onChange={onChange} />
        ))}
      </div>
    </fieldset>
  );
}

/** Every overlay as a checkbox: ungrouped ones first, then each group under its own switch. */
export function OverlayToggles({ context, selected, onChange }: { context: OverlayContext; selected: readonly string[]; onChange: (next: readonly string[]) => void }) {
  return (
    <fieldset className="flex flex-col gap-1.5">
      <legend className="sr-only">Layers over the field</legend>
      {MAP_OVERLAYS.filter((overlay) => !overlay.group).map((overlay) => (
        <OverlayToggle key={overlay.id} overlay={overlay} context={context} selected={selected} onChange={onChange} />
      ))}
      {MAP_OVERLAY_GROUPS.map((group) => (
        <GroupToggles key={group.id} group={group} context={context} selected={selected} onChange={onChange} />
      ))}
    </fieldset>
  );
}

/** The legends of the groups that have a visible overlay. */
export function OverlayGroupLegends({ context, selected }: { context: OverlayContext; selected: readonly string[] }) {
  return (
    <>
      {MAP_OVERLAY_GROUPS.map((group) => {
        const visible = MAP_OVERLAYS.filter((overlay) => overlay.group === group.id && selected.includes(overlay.id) && !overlay.unavailableReason?.(context)).map((overlay) => overlay.id);
        if (visible.length === 0 || !group.legend) return null;
        return <div key={group.id}>{group.legend(context, visible)}</div>;
      })}
    </>
  );
}
