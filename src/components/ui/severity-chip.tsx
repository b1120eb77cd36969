import { severityLevel, type Severity } from "@shared/rules/index.ts";

/**
 * A severity on Bellwether's own scale: the label always written out, on the level's colour (each
 * keeps white text readable), so the meaning never rests on hue alone.
 */
export function SeverityChip({ severity, className = "" }: { severity: Severity; className?: string }) {
  const level = severityLevel(severity);
  return (
    <span
      title={level.meaning}
      className={`inline-flex items-center rounded px-1.5 py-px text-xs font-medium whitespace-nowrap ${className}`}
      style={{ background: level.colour, color: level.textColour }}
    >
      {level.label}
    </span>
  );
}
