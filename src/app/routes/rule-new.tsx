import { can } from "@shared/auth/permissions.ts";
import { NewRulePage } from "@/features/rules/components/rule-editor-page.tsx";
import { useSignedInUser } from "@/lib/auth.ts";
import { useRuleRecipientOptions, WithZones } from "./rule-route-data.tsx";

/** Lazy route module: the editor for a new rule. */
export function Component() {
  const user = useSignedInUser();
  const recipients = useRuleRecipientOptions();
  return <WithZones>{(zones) => <NewRulePage canEdit={can(user.roles, "rules.write")} zones={zones} recipients={recipients} />}</WithZones>;
}
