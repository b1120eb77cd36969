import type { RuleDto } from "@shared/api/rules.ts";
import { useToast } from "@/components/ui/toaster.tsx";
import { describeErrorLine } from "@/lib/describe-error.ts";
import { useSetRuleEnabled } from "../api/set-rule-enabled.ts";

/**
 * A rule's on/off switch. Turning it is saved as a new version, so the history says who switched it and
 * when. Roles that cannot edit see the state only.
 */
export function RuleEnabledSwitch({ rule, canEdit }: { rule: RuleDto; canEdit: boolean }) {
  const setEnabled = useSetRuleEnabled();
  const toast = useToast();
  const on = setEnabled.isPending ? !rule.enabled : rule.enabled;
  if (!canEdit) return <span className={on ? "text-ok" : "text-muted"}>{on ? "On" : "Off"}</span>;
  return (
    <button
      type="button"
      role="switch"
      aria-checked={on}
      aria-label={`${rule.name} is ${on ? "on" : "off"}`}
      disabled={setEnabled.isPending}
      onClick={() =>
        setEnabled.mutate(
          { id: rule.id, enabled: !rule.enabled },
          {
            onSuccess: (updated) => toast.success(`${updated.name} turned ${updated.enabled ? "on" : "off"}`, `Saved as version ${updated.current.version}.`),
            onError: (error) => toast.error(`${rule.name} was not switched`, describeErrorLine(error)),
          },
        )
      }
      className="group inline-flex items-center gap-2 disabled:opacity-60"
    >
      <span className={`relative inline-block h-4 w-7 rounded-full border transition-colors ${on ? "border-ok/60 bg-ok/30" : "border-line bg-raised"}`}>
        <span className={`absolute top-0.5 h-2.5 w-2.5 rounded-full transition-[left] ${on ? "left-3.5 bg-ok" : "left-0.5 bg-muted"}`} />
      </span>
      <span className={`text-xs ${on ? "text-ok" : "text-muted"}`}>{on ? "On" : "Off"}</span>
    </button>
  );
}
