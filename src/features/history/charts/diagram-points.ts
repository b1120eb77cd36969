import type { VerificationDto } from "@shared/api/verification.ts";
import type { DiagramPoint } from "./performance-diagram.tsx";

const SHAPES: DiagramPoint["shape"][] = ["square", "diamond", "triangle", "circle"];
const COLOURS = ["var(--bw-focus)", "var(--bw-ok)", "var(--bw-caution)", "var(--bw-danger)", "var(--bw-muted)"];

/** The selection as one point, then each version (or each rule when every rule is scored together). */
export function diagramPoints(result: VerificationDto, overallLabel: string): DiagramPoint[] {
  const rows =
    result.byVersion.length > 1
      ? result.byVersion.map((r) => ({ id: `v${r.versionId}`, label: `${r.ruleName} v${r.version}`, scores: r.scores }))
      : result.byRule.length > 1
        ? result.byRule.map((r) => ({ id: `r${r.ruleId}`, label: r.ruleName, scores: r.scores }))
        : [];
  return [
    { id: "overall", label: overallLabel, successRatio: result.overall.scores.successRatio, pod: result.overall.scores.pod, shape: "circle", colour: "var(--bw-accent)" },
    ...rows.map((r, k) => ({ id: r.id, label: r.label, successRatio: r.scores.successRatio, pod: r.scores.pod, shape: SHAPES[k % SHAPES.length]!, colour: COLOURS[k % COLOURS.length]! })),
  ];
}
