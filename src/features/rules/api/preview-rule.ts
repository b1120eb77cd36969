import { keepPreviousData, queryOptions, useQuery } from "@tanstack/react-query";
import type { PreviewInput } from "@shared/api/rules.ts";
import { api } from "@/lib/api-client.ts";
import { previewDto, type PreviewDto } from "./rule-map-dtos.ts";
import { ruleKeys } from "./rule-keys.ts";

/** Where an unsaved expression matches on the newest stored frame. */
export async function previewRule(input: PreviewInput, signal?: AbortSignal): Promise<PreviewDto> {
  return api.post("/api/rules/preview", input, { schema: previewDto, signal });
}

export const rulePreviewQuery = (input: PreviewInput) =>
  queryOptions({
    queryKey: ruleKeys.preview(input),
    queryFn: ({ signal }) => previewRule(input, signal),
    staleTime: 30_000,
    retry: false,
  });

/** `input` should already be debounced; null skips the preview (an invalid expression, a read-only viewer). */
export function useRulePreview(input: PreviewInput | null) {
  return useQuery({
    ...rulePreviewQuery(input ?? { expression: "", zoneIds: [], spatialCondition: { kind: "any-point" } }),
    enabled: input !== null,
    // The last map stays up while the next one is computed, so the preview does not flicker.
    placeholderData: keepPreviousData,
  });
}
