import type { PreviewInput } from "@shared/api/rules.ts";

/** The one query-key factory for rules: every rule mutation invalidates `ruleKeys.all`. */
export const ruleKeys = {
  all: ["rules"] as const,
  list: () => [...ruleKeys.all, "list"] as const,
  detail: (ruleId: number) => [...ruleKeys.all, "detail", ruleId] as const,
  versions: (ruleId: number) => [...ruleKeys.all, "versions", ruleId] as const,
  preview: (input: PreviewInput) => [...ruleKeys.all, "preview", input] as const,
};
