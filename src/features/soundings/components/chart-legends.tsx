import type { ReactNode } from "react";
import type { SoundingReportDto } from "@shared/api/soundings.ts";
import { formatNumber, formatWindKnots } from "@/lib/format-units.ts";
import { useTheme } from "@/lib/theme.tsx";
import { bandColor, chartPalette, PARCEL_DASHES } from "../chart/chart-palette.ts";
import { HEIGHT_BANDS } from "../chart/hodograph-geometry.ts";
import { fieldText } from "../field-groups.ts";
import { PARCEL_IDS, PARCEL_NAMES, PARCEL_ORIGINS, PARCEL_TAGS, type ParcelId } from "../parcels.ts";
import { directionFrom } from "../sounding-summary.ts";

function LineSwatch({ color, dash, width = 2.4 }: { color: string; dash?: string; width?: number }) {
  return (
    <svg width="26" height="10" aria-hidden="true" className="shrink-0">
      <line x1="1" x2="25" y1="5" y2="5" stroke={color} strokeWidth={width} strokeDasharray={dash || undefined} />
    </svg>
  );
}

function AreaSwatch({ color }: { color: string }) {
  return <span aria-hidden="true" className="inline-block h-2.5 w-5 shrink-0 rounded-sm" style={{ backgroundColor: color, opacity: 0.55 }} />;
}

function Item({ swatch, children }: { swatch: ReactNode; children: ReactNode }) {
  return (
    <li className="flex items-center gap-1.5">
      {swatch}
      <span>{children}</span>
    </li>
  );
}

/** What each line and shade of the skew-T means. */
export function SkewTLegend({ shaded, virtual }: { shaded: ParcelId; virtual: boolean }) {
  const palette = chartPalette(useTheme().theme);
  return (
    <div className="mt-2 text-xs text-muted">
      <ul className="flex flex-wrap gap-x-4 gap-y-1" aria-label="Skew-T legend">
        <Item swatch={<LineSwatch color={palette.temperature} />}>Temperature</Item>
        <Item swatch={<LineSwatch color={palette.dewpoint} />}>Dewpoint</Item>
        <Item swatch={<LineSwatch color={palette.temperature} dash="3 3" width={1.2} />}>{virtual ? "Virtual temperature" : "Temperature compared"}</Item>
        {PARCEL_IDS.map((id) => (
          <Item key={id} swatch={<LineSwatch color={palette.parcels[id]} dash={PARCEL_DASHES[id]} width={id === shaded ? 2.4 : 1.6} />}>
            {PARCEL_TAGS[id]} parcel
          </Item>
        ))}
        <Item swatch={<AreaSwatch color={palette.positiveArea} />}>CAPE ({PARCEL_TAGS[shaded]})</Item>
        <Item swatch={<AreaSwatch color={palette.negativeArea} />}>CIN ({PARCEL_TAGS[shaded]})</Item>
      </ul>
      <p className="mt-1.5">
        Shaded: the {PARCEL_NAMES[shaded]} parcel ({PARCEL_ORIGINS[shaded]}).{" "}
        {virtual
          ? "Parcel paths and areas use virtual temperature, as the CAPE and CIN numbers do (Doswell and Rasmussen 1994)."
          : "The virtual-temperature correction is off for this report."}{" "}
        Faint lines: dry adiabats (solid), pseudo-adiabats (dashed), saturation mixing ratio in g/kg (dotted). Barbs in knots.
      </p>
    </div>
  );
}

function motion(label: string, pair: readonly [number, number]): string {
  return `${label} ${String(directionFrom(pair[0], pair[1])).padStart(3, "0")}° ${formatWindKnots(Math.hypot(pair[0], pair[1]))}`;
}

/** Height bands, storm motions and the effective inflow layer of the hodograph. */
export function HodographLegend({ report }: { report: SoundingReportDto }) {
  const palette = chartPalette(useTheme().theme);
  const eff = report.effectiveLayer;
  return (
    <div className="mt-2 text-xs text-muted">
      <ul className="flex flex-wrap gap-x-4 gap-y-1" aria-label="Hodograph legend">
        {HEIGHT_BANDS.map((band, i) => (
          <Item key={band.id} swatch={<LineSwatch color={bandColor(palette, i)} width={3.2} />}>
            {band.label}
          </Item>
        ))}
        <Item swatch={<AreaSwatch color={palette.inflow} />}>Effective inflow sweep</Item>
      </ul>
      <dl className="mt-2 grid grid-cols-[auto_1fr] gap-x-3 gap-y-0.5 font-mono text-ink [font-variant-ligatures:none]">
        <dt className="text-muted">Storm motion</dt>
        <dd>{report.stormMotion ? `${motion("RM", report.stormMotion.rm)} · ${motion("LM", report.stormMotion.lm)}` : "undefined (too little shear)"}</dd>
        <dt className="text-muted">Effective inflow</dt>
        <dd data-testid="effective-layer-note">
          {eff ? `${formatNumber(eff.baseHeight)}–${formatNumber(eff.topHeight)} m AGL · ESRH ${fieldText("srh_eff", report.fields)}` : "none (no level with enough CAPE and little enough CIN)"}
        </dd>
        <dt className="text-muted">Low-level SRH</dt>
        <dd>
          0–1 km {fieldText("srh_0_1km", report.fields)} · 0–3 km {fieldText("srh_0_3km", report.fields)}
        </dd>
      </dl>
      <p className="mt-1.5">Dots mark 1, 3, 6 and 9 km AGL; + is the 0–6 km mean wind; rings in knots.</p>
    </div>
  );
}
