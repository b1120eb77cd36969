import { can } from "@shared/auth/permissions.ts";
import { RulesPage } from "@/features/rules/components/rules-page.tsx";
import { useSignedInUser } from "@/lib/auth.ts";
import { WithZones } from "./rule-route-data.tsx";

/** Lazy route module: the list of rules. */
export function Component() {
  const user = useSignedInUser();
  return <WithZones>{(zones) => <RulesPage canEdit={can(user.roles, "rules.write")} zones={zones} />}</WithZones>;
}
