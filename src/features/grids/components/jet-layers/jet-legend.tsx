import type { ReactNode } from "react";
import { Notice } from "@/components/ui/notice.tsx";
import { describeError } from "@/lib/describe-error.ts";
import { formatNumber, formatWindKnots } from "@/lib/format-units.ts";
import type { MapFrame } from "../../api/get-frame.ts";
import { useJetStreaks } from "../../api/get-jet-streaks.ts";
import { ISOTACH_FIRST_KNOTS, ISOTACH_STEP_KNOTS } from "../../jet-layers/isotach-levels.ts";
import { QUADRANT_STYLES } from "../../jet-layers/quadrant-legend.ts";
import { describeStreak, jetLevelWords } from "../../jet-layers/streak-words.ts";
import { JET_LAYER_IDS, type JetLayerId } from "./jet-layer-ids.ts";
import { AmbiguousSwatch, CoreSwatch, FavouredSwatch, KeyArrow, LineSwatch, QuadrantSwatch } from "./jet-legend-swatches.tsx";
import { JET_COLOURS } from "./jet-palette.ts";
import { useAgeostrophicWind } from "./use-arrow-scale.ts";

function Part({ title, children }: { title: string; children: ReactNode }) {
  return (
    <div className="flex flex-col gap-1">
      <h4 className="text-xs font-semibold">{title}</h4>
      {children}
    </div>
  );
}

function Row({ swatch, children }: { swatch: ReactNode; children: ReactNode }) {
  return (
    <li className="flex items-center gap-1.5">
      {swatch}
      <span>{children}</span>
    </li>
  );
}

function StreaksPart({ frame }: { frame: MapFrame }) {
  const streaks = useJetStreaks(frame.id);
  const list = streaks.data?.streaks ?? [];
  return (
    <Part title="Streak axes and cores">
      <p className="flex items-center gap-1.5 text-xs text-muted">
        <CoreSwatch /> Axis along the fastest wind, arrowhead downstream; the disc is the core.
      </p>
      {streaks.data && list.length === 0 && <p className="text-xs">No jet streak on this frame: no wind at the jet level reached the core speed.</p>}
      {list.length > 0 && (
        <ul aria-label="Jet streaks" className="flex flex-col gap-0.5 text-xs">
          {list.map((streak, index) => (
            <li key={streak.id} className="tabular-nums">
              {describeStreak(streak, index + 1)}
            </li>
          ))}
        </ul>
      )}
    </Part>
  );
}

function IsotachsPart({ frame }: { frame: MapFrame }) {
  const max = frame.fields.find((field) => field.key === "jet_speed")?.max ?? null;
  return (
    <Part title="Isotachs">
      <p className="flex items-center gap-1.5 text-xs">
        <LineSwatch colour={JET_COLOURS.isotach} width={1.5} />
        <span>
          Jet-level wind speed every {ISOTACH_STEP_KNOTS} kt from {ISOTACH_FIRST_KNOTS} kt, labelled in kt
          <span className="text-muted"> · fastest here {formatWindKnots(max)}</span>
        </span>
      </p>
    </Part>
  );
}

function QuadrantsPart() {
  return (
    <Part title="Quadrants">
      <ul aria-label="Jet-streak quadrants" className="flex flex-wrap gap-x-3 gap-y-1 text-xs">
        {QUADRANT_STYLES.map((style) => (
          <Row key={style.code} swatch={<QuadrantSwatch colour={style.colour} />}>
            {style.words}
          </Row>
        ))}
      </ul>
      <ul aria-label="Divergence readings" className="flex flex-col gap-1 text-xs">
        <Row swatch={<FavouredSwatch />}>
          <span className="font-medium">divergence favoured</span>
          <span className="text-muted"> by the streak's shape and hemisphere</span>
        </Row>
        <Row swatch={<AmbiguousSwatch />}>
          <span className="font-medium">ambiguous</span>
          <span className="text-muted">: divergent for a straight streak, put in doubt by the axis curvature</span>
        </Row>
      </ul>
      <p className="text-xs text-muted">
        A straight streak favours the left exit and right entrance in the Northern Hemisphere (right exit and left entrance in the Southern). A
        cyclonically curved streak favours both exits and the downstream half of the core instead; an anticyclonic one both entrances and the upstream
        half.
      </p>
    </Part>
  );
}

function ArrowsPart({ frame }: { frame: MapFrame }) {
  const { scale } = useAgeostrophicWind(frame);
  return (
    <Part title="Ageostrophic wind">
      <p className="flex items-center gap-1.5 text-xs">
        <KeyArrow />
        <span className="tabular-nums" data-testid="ageostrophic-key">
          {scale ? `${scale.keySpeed} m/s (${formatWindKnots(scale.keySpeed)})` : "…"}
        </span>
        <span className="text-muted">
          wind minus geostrophic wind, arrows to scale{scale && `; none drawn below ${formatNumber(scale.slowestDrawn, 1)} m/s`}
        </span>
      </p>
    </Part>
  );
}

/** What the visible jet-level layers show: the level, its data-quality notes, and a key for each layer. */
export function JetLegend({ frame, visible }: { frame: MapFrame; visible: readonly string[] }) {
  const streaks = useJetStreaks(frame.id);
  const shown = (id: JetLayerId) => visible.includes(JET_LAYER_IDS[id]);
  return (
    <section aria-label="Jet level legend" className="flex flex-col gap-2.5 border-t border-line pt-2.5">
      <h3 className="text-xs font-semibold">
        Jet level <span className="font-normal text-muted">·</span> {streaks.data ? jetLevelWords(streaks.data.jetLevelPressure) : "…"}
      </h3>
      {streaks.isError && (
        <Notice tone="danger" title="Could not load the jet streaks">
          {describeError(streaks.error).message}
        </Notice>
      )}
      {streaks.data && streaks.data.warnings.length > 0 && (
        <Notice tone="caution" title="Notes on the jet diagnostics of this frame">
          <ul className="list-disc pl-4">
            {streaks.data.warnings.map((warning) => (
              <li key={warning}>{warning}</li>
            ))}
          </ul>
        </Notice>
      )}
      {shown("axes") && <StreaksPart frame={frame} />}
      {shown("isotachs") && <IsotachsPart frame={frame} />}
      {shown("quadrants") && <QuadrantsPart />}
      {shown("arrows") && <ArrowsPart frame={frame} />}
    </section>
  );
}
