import { AuditPage } from "@/features/audit/components/audit-page.tsx";

/** Lazy route module: React Router picks up `Component`. */
export function Component() {
  return <AuditPage />;
}
