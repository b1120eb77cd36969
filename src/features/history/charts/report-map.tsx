import { useMemo } from "react";
import { geoArea, geoConicConformal, geoPath, type GeoPermissibleObjects } from "d3-geo";
import type { StormReportKind } from "@shared/storm-reports/storm-report-kinds.ts";
import { describeReport } from "../format-verification.ts";

export type ReportOutcome = "detected" | "late" | "missed";

export interface MapReport {
  id: number;
  latitude: number;
  longitude: number;
  kind: StormReportKind;
  magnitude: number | null;
  magnitudeUnit: string | null;
  outcome: ReportOutcome;
  time: string;
}

export interface MapZone {
  id: number;
  code: string;
  geometry: unknown;
  /** A trigger of this zone was verified / only false alarms / none at all. */
  status: "verified" | "false-alarm" | "quiet";
}

const WIDTH = 560;
const HEIGHT = 380;
export const OUTCOME_STYLE: Record<ReportOutcome, { colour: string; label: string }> = {
  detected: { colour: "var(--bw-ok)", label: "detected" },
  late: { colour: "var(--bw-caution)", label: "late (came before its trigger opened)" },
  missed: { colour: "var(--bw-danger)", label: "missed" },
};
const ZONE_FILL: Record<MapZone["status"], string> = { verified: "var(--bw-ok)", "false-alarm": "var(--bw-danger)", quiet: "transparent" };

type Rings = number[][][];

/**
 * d3-geo reads polygons on the sphere, where ring order says which side is inside: an exterior ring
 * in GeoJSON's counter-clockwise order would enclose the rest of the globe. Rings of any polygon
 * that would cover more than a hemisphere are reversed, so every zone draws as the small area it is.
 */
export function ringsForSphere(geometry: unknown): unknown {
  const g = geometry as { type: string; coordinates: Rings | Rings[] };
  const fix = (rings: Rings) => (geoArea({ type: "Polygon", coordinates: rings } as GeoPermissibleObjects) > 2 * Math.PI ? rings.map((r) => [...r].reverse()) : rings);
  if (g.type === "Polygon") return { type: "Polygon", coordinates: fix(g.coordinates as Rings) };
  if (g.type === "MultiPolygon") return { type: "MultiPolygon", coordinates: (g.coordinates as Rings[]).map(fix) };
  return geometry;
}

/** Kind by shape (tornado triangle, hail circle, wind square), outcome by colour and by the legend's words. */
function ReportMark({ x, y, kind, colour }: { x: number; y: number; kind: StormReportKind; colour: string }) {
  const common = { fill: colour, stroke: "var(--bw-canvas)", strokeWidth: 1.5 };
  if (kind === "tornado") return <path d={`M${x},${y - 7}L${x + 7},${y + 5}L${x - 7},${y + 5}Z`} {...common} />;
  if (kind === "wind") return <rect x={x - 5} y={y - 5} width={10} height={10} {...common} />;
  return <circle cx={x} cy={y} r={5.5} {...common} />;
}

/** The scored zones and the storm reports on one small conformal map (zones tinted by how their triggers fared). */
export function ReportMap({ zones: given, reports, title }: { zones: readonly MapZone[]; reports: readonly MapReport[]; title: string }) {
  const zones = useMemo(() => given.map((z) => ({ ...z, geometry: ringsForSphere(z.geometry) })), [given]);
  const geometry = useMemo(() => {
    const features = [
      ...zones.map((z) => ({ type: "Feature", properties: {}, geometry: z.geometry })),
      ...reports.map((r) => ({ type: "Feature", properties: {}, geometry: { type: "Point", coordinates: [r.longitude, r.latitude] } })),
    ];
    if (features.length === 0) return null;
    // Zone geometry arrives already checked as GeoJSON (shared zone schema); d3 only needs its shape.
    const collection = { type: "FeatureCollection", features } as unknown as GeoPermissibleObjects;
    // Lambert conformal with standard parallels around the area shown, as regional maps commonly use.
    const lats = reports.map((r) => r.latitude);
    const centre = lats.length ? lats.reduce((a, b) => a + b, 0) / lats.length : 36;
    const projection = geoConicConformal()
      .parallels([centre - 3, centre + 3])
      .fitExtent(
        [
          [16, 16],
          [WIDTH - 16, HEIGHT - 16],
        ],
        collection,
      );
    return { projection, path: geoPath(projection) };
  }, [zones, reports]);

  if (!geometry) return <p className="text-muted">Nothing to map.</p>;
  const { projection, path } = geometry;
  return (
    <figure className="flex flex-col gap-2">
      <svg role="img" aria-label={`${title}: ${zones.length} zones and ${reports.length} storm reports`} viewBox={`0 0 ${WIDTH} ${HEIGHT}`} className="w-full max-w-[640px] rounded border border-line bg-canvas">
        {zones.map((z) => {
          const d = path(z.geometry as GeoPermissibleObjects) ?? "";
          const [cx, cy] = path.centroid(z.geometry as GeoPermissibleObjects);
          return (
            <g key={z.id} data-zone={z.code}>
              <path d={d} fill={ZONE_FILL[z.status]} fillOpacity={0.12} stroke="var(--bw-muted)" strokeWidth={1} />
              <text x={cx} y={cy} textAnchor="middle" fontSize={11} fill="var(--bw-muted)">
                {z.code}
              </text>
            </g>
          );
        })}
        {reports.map((r) => {
          const at = projection([r.longitude, r.latitude]);
          if (!at) return null;
          return (
            <g key={r.id} data-report={r.id} data-outcome={r.outcome}>
              <title>{`${describeReport(r)} at ${r.time.slice(11, 16)}Z: ${OUTCOME_STYLE[r.outcome].label}`}</title>
              <ReportMark x={at[0]} y={at[1]} kind={r.kind} colour={OUTCOME_STYLE[r.outcome].colour} />
            </g>
          );
        })}
      </svg>
      <figcaption className="flex flex-wrap gap-x-4 gap-y-1 text-xs text-muted">
        <span>Shapes: ▲ tornado, ● hail, ■ wind.</span>
        {(Object.keys(OUTCOME_STYLE) as ReportOutcome[]).map((outcome) => (
          <span key={outcome} className="flex items-center gap-1">
            <span aria-hidden="true" className="inline-block h-2.5 w-2.5 rounded-full" style={{ background: OUTCOME_STYLE[outcome].colour }} />
            {OUTCOME_STYLE[outcome].label}
          </span>
        ))}
        <span>Zones tinted green where a trigger verified, red where only false alarms.</span>
      </figcaption>
    </figure>
  );
}
