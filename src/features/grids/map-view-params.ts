/**
 * The map viewer's settings live in the URL (`?field=mlcape&show=outlines,contours`), so stepping
 * through valid times keeps them and a copied link opens the same view.
 */
export interface MapViewSettings {
  /** Null: the viewer picks its default field. */
  field: string | null;
  overlays: readonly string[];
}

const FIELD_KEY_PATTERN = /^[a-z0-9_]{1,60}$/;

export function mapViewFromSearch(search: URLSearchParams, defaultOverlays: readonly string[], knownOverlays: readonly string[]): MapViewSettings {
  const field = search.get("field");
  const show = search.get("show");
  return {
    field: field && FIELD_KEY_PATTERN.test(field) ? field : null,
    // "show=" (empty) means every overlay off; no "show" at all means the defaults.
    overlays: show === null ? defaultOverlays : show.split(",").filter((id) => knownOverlays.includes(id)),
  };
}

export function searchFromMapView(settings: MapViewSettings, defaultOverlays: readonly string[]): URLSearchParams {
  const search = new URLSearchParams();
  if (settings.field) search.set("field", settings.field);
  const sameAsDefault = settings.overlays.length === defaultOverlays.length && settings.overlays.every((id) => defaultOverlays.includes(id));
  if (!sameAsDefault) search.set("show", settings.overlays.join(","));
  return search;
}
