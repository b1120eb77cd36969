import { NotFound } from "@/components/errors/not-found.tsx";
import { can } from "@shared/auth/permissions.ts";
import { NotAvailable } from "@/components/errors/not-available.tsx";
import { RuleBacktestPage } from "@/features/rules/components/rule-backtest-page.tsx";
import { useSignedInUser } from "@/lib/auth.ts";
import { useRuleIdParam, WithZones } from "./rule-route-data.tsx";

/** Lazy route module: a rule version run over stored frames (leads). */
export function Component() {
  const user = useSignedInUser();
  const ruleId = useRuleIdParam();
  if (ruleId === null) return <NotFound />;
  if (!can(user.roles, "rules.backtest")) return <NotAvailable area="Backtests" roles={user.roles} />;
  return <WithZones>{(zones) => <RuleBacktestPage ruleId={ruleId} zones={zones} />}</WithZones>;
}
