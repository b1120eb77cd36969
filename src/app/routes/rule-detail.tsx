import { NotFound } from "@/components/errors/not-found.tsx";
import { can } from "@shared/auth/permissions.ts";
import { RuleEditorPage } from "@/features/rules/components/rule-editor-page.tsx";
import { useSignedInUser } from "@/lib/auth.ts";
import { useRuleRecipientOptions, useRuleIdParam, WithZones } from "./rule-route-data.tsx";

/** Lazy route module: one rule in the editor (read-only for roles that cannot edit). */
export function Component() {
  const user = useSignedInUser();
  const recipients = useRuleRecipientOptions();
  const ruleId = useRuleIdParam();
  if (ruleId === null) return <NotFound />;
  return (
    <WithZones>
      {(zones) => (
        <RuleEditorPage
          ruleId={ruleId}
          canEdit={can(user.roles, "rules.write")}
          canBacktest={can(user.roles, "rules.backtest")}
          zones={zones}
          recipients={recipients}
        />
      )}
    </WithZones>
  );
}
