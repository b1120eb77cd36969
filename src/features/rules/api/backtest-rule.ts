import { useMutation } from "@tanstack/react-query";
import type { BacktestInput } from "@shared/api/rules.ts";
import { api } from "@/lib/api-client.ts";
import { backtestDto } from "./rule-map-dtos.ts";

/** Runs a rule version over the stored frames of the last N runs; nobody is notified. */
export async function backtestRule({ ruleId, input }: { ruleId: number; input: BacktestInput }) {
  return api.post(`/api/rules/${ruleId}/backtest`, input, { schema: backtestDto });
}

export function useBacktestRule() {
  return useMutation({ mutationFn: backtestRule });
}
