import { NotFound } from "@/components/errors/not-found.tsx";
import { RuleHistoryPage } from "@/features/rules/components/rule-history-page.tsx";
import { useRuleIdParam, useRuleRecipientOptions, WithZones } from "./rule-route-data.tsx";

/** Lazy route module: a rule's versions and the differences between them. */
export function Component() {
  const ruleId = useRuleIdParam();
  const recipients = useRuleRecipientOptions();
  if (ruleId === null) return <NotFound />;
  return <WithZones>{(zones) => <RuleHistoryPage ruleId={ruleId} zones={zones} recipients={recipients} />}</WithZones>;
}
