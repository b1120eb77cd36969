/**
 * The map kit: a grid drawn in its own projection, with layers stacked inside a MapStage.
 *
 *   <MapStage geometry={geometry} maxHeight={480}>
 *     <FieldRasterLayer field={values} scale={scale} />   the field, coloured by its scale
 *     <OutlinesLayer />                                   coasts and borders
 *     <ZoneOutlineLayer zones={[zone]} />                 forecast zones (GeoJSON)
 *     <MaskLayer mask={matched} />                        a 0/1 area, tinted and hatched
 *     <MapPointerSurface label=… onPoint=… onPick=… />    pointer and keyboard, always last
 *   </MapStage>
 *
 * New layers draw through LayerCanvas and read the grid and its screen mapping from useMapViewport.
 * Field values come from useFieldValues (or any Float32Array in the grid's row-major layout).
 */

export { MapStage, MAP_GROUND, useMapViewport, type MapViewport } from "./map-stage.tsx";
export { LayerCanvas, type DrawLayer } from "./layer-canvas.tsx";
export { FieldRasterLayer } from "./field-raster-layer.tsx";
export { ContoursLayer } from "./contours-layer.tsx";
export { OutlinesLayer } from "./outlines-layer.tsx";
export { ZoneOutlineLayer } from "./zone-outline-layer.tsx";
export { MaskLayer } from "./mask-layer.tsx";
export { PointMarkerLayer } from "./point-marker-layer.tsx";
export { MapPointerSurface, type MapPoint } from "./map-pointer-surface.tsx";
export { MapReadout } from "./map-readout.tsx";
export { MapLegend } from "./map-legend.tsx";
export { FieldPicker } from "./field-picker.tsx";

export { useFieldValues, fieldValuesQuery, getFieldValues, decodeFieldBytes, type FieldValues } from "./field-values.ts";
export { mapKeys } from "./map-keys.ts";
export {
  chooseColourScale,
  unionRange,
  parseColour,
  tickDecimals,
  RAMP_STEPS,
  type ColourScale,
  type RampScale,
  type CategoricalScale,
  type CategoryEntry,
  type ValueRange,
} from "./colour-scale.ts";
export {
  describeMapField,
  groupMapFields,
  defaultFieldKey,
  formatMapValue,
  toDisplayValue,
  GROUP_LABELS,
  type MapField,
  type MapFieldGroup,
  type MapFieldGroupList,
} from "./map-fields.ts";
export { cellAspect, fitGridToBox, gridToCanvas, canvasToGrid, cellAtCanvas, type GridCanvasTransform, type XY, type IJ } from "./grid-canvas-transform.ts";
export { projectOutlines, polylineCount, type GridPolylines, type LonLat } from "./project-outlines.ts";
export { projectZoneOutline } from "./project-zone-outline.ts";
export { contourLevels, traceContours, type ContourLevel } from "./field-contours.ts";
export { labelContourLevels } from "./contour-labels.ts";
export { paintField } from "./paint-field.ts";
export { paintMask, maskCount } from "./paint-mask.ts";
export { tracePolylines } from "./stroke-polylines.ts";
export { formatLatLon } from "./format-lat-lon.ts";
