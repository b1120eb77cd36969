import { createHash } from "node:crypto";

/** The fields of an audit row that its hash covers, in stored (string) form. */
export interface AuditHashInput {
  at: string;
  actor: string | null;
  actorRoles: string;
  action: string;
  targetType: string;
  targetId: string | null;
  beforeJson: string | null;
  afterJson: string | null;
  requestId: string | null;
  prevHash: string;
}

/** The chain starts from a fixed all-zero hash. */
export const GENESIS_HASH = "0".repeat(64);

/** SHA-256 (FIPS 180-4) over a fixed-order JSON array of the row's content and the previous hash. */
export function hashAuditRow(row: AuditHashInput): string {
  const canonical = JSON.stringify([
    row.at,
    row.actor,
    row.actorRoles,
    row.action,
    row.targetType,
    row.targetId,
    row.beforeJson,
    row.afterJson,
    row.requestId,
    row.prevHash,
  ]);
  return createHash("sha256").update(canonical, "utf8").digest("hex");
}
