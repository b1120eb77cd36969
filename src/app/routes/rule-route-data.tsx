import type { ReactNode } from "react";
import { useParams } from "react-router-dom";
import type { ZoneDto } from "@shared/api/zones.ts";
import { can } from "@shared/auth/permissions.ts";
import { Loading } from "@/components/ui/loading.tsx";
import { Notice } from "@/components/ui/notice.tsx";
import type { RecipientOptions, ZoneOption } from "@/features/rules/editor/rule-editor-types.ts";
import { useRecipientOptions } from "@/features/rules/api/get-recipient-options.ts";
import { useZones } from "@/features/zones/api/get-zones.ts";
import { useSignedInUser } from "@/lib/auth.ts";
import { describeError } from "@/lib/describe-error.ts";

/**
 * What the rule pages take from other features, composed here so features never import each other:
 * the office's zones (for pickers, labels and map outlines) and the contacts a rule may notify.
 */
const toZoneOption = (zone: ZoneDto): ZoneOption => ({ id: zone.id, code: zone.code, name: zone.name, coversNothing: zone.coversNothing, geometry: zone.geometry });

/** Renders `children(zones)` once the zones are loaded. */
export function WithZones({ children }: { children: (zones: ZoneOption[]) => ReactNode }) {
  const zones = useZones();
  if (zones.isPending) return <Loading label="Loading zones…" />;
  if (zones.isError) {
    return (
      <Notice tone="danger" title="Could not load the zones">
        {describeError(zones.error).message}
      </Notice>
    );
  }
  return <>{children(zones.data.map(toZoneOption))}</>;
}

/** The contacts and groups a rule may notify, for roles allowed to read them. */
export function useRuleRecipientOptions(): RecipientOptions {
  const user = useSignedInUser();
  return useRecipientOptions(can(user.roles, "contacts.read"));
}

/** The `:ruleId` of the URL as a positive whole number, or null. */
export function useRuleIdParam(): number | null {
  const { ruleId } = useParams();
  const id = Number(ruleId);
  return Number.isInteger(id) && id > 0 ? id : null;
}

