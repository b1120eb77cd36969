import type { ZoneDto } from "@shared/api/zones.ts";
import { Button } from "@/components/ui/button.tsx";
import { Dialog } from "@/components/ui/dialog.tsx";
import { Notice } from "@/components/ui/notice.tsx";
import { useToast } from "@/components/ui/toaster.tsx";
import { describeError } from "@/lib/describe-error.ts";
import { useArchiveZone } from "../api/archive-zone.ts";

export function ArchiveZoneDialog({ zone, onClose }: { zone: ZoneDto; onClose: () => void }) {
  const archiveZone = useArchiveZone();
  const toast = useToast();
  const archive = () =>
    archiveZone.mutate(zone.id, {
      onSuccess: () => {
        toast.success(`Zone ${zone.code} archived`);
        onClose();
      },
    });
  return (
    <Dialog open onClose={onClose} width="sm" title={`Archive zone ${zone.code}?`} description={zone.name}>
      <div className="flex flex-col gap-3">
        <p>
          The zone leaves this list and no new rule can use it. Saved rule versions and triggers keep pointing at it, so the history stays
          readable. Rules that still name it should be edited.
        </p>
        {archiveZone.error != null && <Notice tone="danger">{describeError(archiveZone.error).message}</Notice>}
        <div className="flex justify-end gap-2">
          <Button onClick={onClose}>Cancel</Button>
          <Button variant="danger" onClick={archive} disabled={archiveZone.isPending}>
            {archiveZone.isPending ? "Archiving…" : "Archive zone"}
          </Button>
        </div>
      </div>
    </Dialog>
  );
}
