import { useMemo } from "react";
import { unitHintsFor } from "../expression/unit-hints.ts";

/**
 * Beside the expression: the unit each named field's thresholds are written in, its display unit,
 * and every threshold converted ("shear_0_6km >= 20 m/s ≈ 39 kt"), so knots and m/s never get mixed up.
 */
export function ExpressionUnitHints({ expression }: { expression: string }) {
  const hints = useMemo(() => unitHintsFor(expression), [expression]);
  if (hints.fields.length === 0 && hints.knots.length === 0) return null;
  return (
    <section aria-label="Units in this expression" className="rounded border border-line bg-raised/40 px-3 py-2 text-xs">
      <ul className="flex flex-col gap-1">
        {hints.fields.map((hint) => (
          <li key={hint.key} className="flex flex-wrap items-baseline gap-x-2">
            <span className="font-mono text-ink">{hint.key}</span>
            <span className="text-muted">
              {hint.note ??
                (hint.storageUnit
                  ? `thresholds in ${hint.storageUnit}${hint.displayUnit ? `, shown in ${hint.displayUnit}` : ""}`
                  : `no unit${hint.displayUnit ? `, shown in ${hint.displayUnit}` : ""}`)}
            </span>
            {hint.conversions.map((line) => (
              <span key={line} className="font-mono text-accent">
                {line}
              </span>
            ))}
          </li>
        ))}
        {hints.knots.map((line) => (
          <li key={line} className="font-mono text-accent">
            {line}
          </li>
        ))}
      </ul>
    </section>
  );
}
