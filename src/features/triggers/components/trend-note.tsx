import { describeTrend } from "../timeline/trend-wording.ts";

const DIRECTION_CLASSES = { grew: "text-caution", shrank: "text-ok", steady: "text-muted", "first-run": "text-muted" } as const;

/** The run-to-run change of a trigger's area, in words with an arrow ("↑ grew 12 pts"). */
export function TrendNote({ trend }: { trend: number | null }) {
  const wording = describeTrend(trend);
  return (
    <span title={wording.sentence} className={`whitespace-nowrap ${DIRECTION_CLASSES[wording.direction]}`}>
      <span aria-hidden="true">{wording.symbol} </span>
      {wording.short}
    </span>
  );
}
