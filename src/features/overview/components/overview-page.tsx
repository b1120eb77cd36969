import { Link } from "react-router-dom";
import { ROLE_LABELS, type Role } from "@shared/auth/permissions.ts";
import type { NavItem } from "@/config/navigation.ts";
import { ROLE_DESCRIPTIONS } from "@/config/role-descriptions.ts";
import { PageHeader } from "@/components/ui/page-header.tsx";
import { Panel } from "@/components/ui/panel.tsx";

/** The landing page. For now it explains what will appear here and what the signed-in roles allow. */
export function OverviewPage({ displayName, roles, areas }: { displayName: string; roles: readonly Role[]; areas: readonly NavItem[] }) {
  return (
    <>
      <PageHeader title="Overview" description={`Signed in as ${displayName}.`} />
      <div className="grid gap-4 lg:grid-cols-[2fr_1fr]">
        <Panel title="What this page will show">
          <p className="max-w-prose">
            Once model runs are flowing in, this page will open on the office's timeline: the triggers that are open now,
            which rule and zone each belongs to, its model run and valid time, and whether the signal grew or faded since
            the previous run. Until then, use the menu on the left.
          </p>
        </Panel>
        <Panel title="Open to you">
          <ul className="flex flex-col gap-1">
            {areas.map((area) => (
              <li key={area.id}>
                <Link to={area.path} className="text-accent underline-offset-2 hover:underline">
                  {area.label}
                </Link>
              </li>
            ))}
          </ul>
        </Panel>
      </div>
      <Panel title="Your roles" className="mt-4">
        <dl className="grid gap-3 md:grid-cols-2">
          {roles.map((role) => (
            <div key={role} className="rounded border border-line bg-raised px-3 py-2">
              <dt className="font-medium">{ROLE_LABELS[role]}</dt>
              <dd className="mt-0.5 text-muted">{ROLE_DESCRIPTIONS[role]}</dd>
            </div>
          ))}
        </dl>
      </Panel>
    </>
  );
}
