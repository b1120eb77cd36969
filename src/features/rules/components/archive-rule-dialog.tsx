import { useNavigate } from "react-router-dom";
import type { RuleDto } from "@shared/api/rules.ts";
import { Button } from "@/components/ui/button.tsx";
import { Dialog } from "@/components/ui/dialog.tsx";
import { Notice } from "@/components/ui/notice.tsx";
import { useToast } from "@/components/ui/toaster.tsx";
import { paths } from "@/config/paths.ts";
import { describeError } from "@/lib/describe-error.ts";
import { useArchiveRule } from "../api/archive-rule.ts";

/** Retiring a rule: it stops running and leaves the list; its versions stay for triggers and the audit trail. */
export function ArchiveRuleDialog({ rule, onClose }: { rule: RuleDto; onClose: () => void }) {
  const archiveRule = useArchiveRule();
  const navigate = useNavigate();
  const toast = useToast();
  const archive = () =>
    archiveRule.mutate(rule.id, {
      onSuccess: () => {
        toast.success(`${rule.name} archived`);
        navigate(paths.rules, { replace: true });
      },
    });
  return (
    <Dialog open onClose={onClose} width="sm" title={`Archive ${rule.name}?`}>
      <div className="flex flex-col gap-3">
        <p>
          The rule stops being checked and leaves the list. Its versions stay, so the triggers it opened still say which version fired. To pause it
          instead, switch it off.
        </p>
        {archiveRule.error != null && <Notice tone="danger">{describeError(archiveRule.error).message}</Notice>}
        <div className="flex justify-end gap-2">
          <Button onClick={onClose}>Cancel</Button>
          <Button variant="danger" onClick={archive} disabled={archiveRule.isPending}>
            {archiveRule.isPending ? "Archiving…" : "Archive rule"}
          </Button>
        </div>
      </div>
    </Dialog>
  );
}
