import { Link } from "react-router-dom";
import { ROLE_LABELS, type Role } from "@shared/auth/permissions.ts";
import type { NavItem } from "@/config/navigation.ts";
import { ROLE_DESCRIPTIONS } from "@/config/role-descriptions.ts";
import { PageHeader } from "@/components/ui/page-header.tsx";
import { Panel } from "@/components/ui/panel.tsx";

/** The account overview: the areas open to the signed-in roles and what each role allows. */
export function OverviewPage({ displayName, roles, areas }: { displayName: string; roles: readonly Role[]; areas: readonly NavItem[] }) {
  return (
    <>
      <PageHeader title="Overview" description={`Signed in as ${displayName}.`} />
      <div className="grid gap-4 lg:grid-cols-[2fr_1fr]">
        <Panel title="Where things are">
          <p className="max-w-prose">
            The timeline is the home page: every trigger as it opens, with its rule, zone, model run and valid time, how
            widespread and how strong it is, and whether it grew or faded since the previous run, beside the grid arrivals
            and escalations. This page sums up your account: the areas open to you and what your roles allow.
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
