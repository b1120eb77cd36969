import { useSearchParams } from "react-router-dom";
import { SectionBoundary } from "@/components/errors/section-boundary.tsx";
import { PageHeader } from "@/components/ui/page-header.tsx";
import { useNotifySettings } from "../api/settings.ts";
import { ContactsPanel } from "./contacts-panel.tsx";
import { FakeInboxesPanel } from "./fake-inboxes-panel.tsx";
import { GroupsPanel } from "./groups-panel.tsx";
import { OnCallPanel } from "./on-call-panel.tsx";
import { TemplatesPanel } from "./templates-panel.tsx";

export interface NotificationPermissions {
  canReadContacts: boolean;
  canWriteContacts: boolean;
  canWriteOnCall: boolean;
  canWriteSettings: boolean;
  canLinkAccounts: boolean;
  canReadFakes: boolean;
}

type Tab = "on-call" | "contacts" | "groups" | "templates" | "inboxes";

const TAB_LABELS: Record<Tab, string> = { "on-call": "On call", contacts: "Contacts", groups: "Groups", templates: "Templates", inboxes: "Fake inboxes" };

function tabsFor(p: NotificationPermissions): Tab[] {
  const tabs: Tab[] = ["on-call"];
  if (p.canReadContacts) tabs.push("contacts", "groups", "templates");
  if (p.canReadFakes) tabs.push("inboxes");
  return tabs;
}

/** Who gets told and how: the on-call schedule, contacts, groups, templates and (for admins) the fakes' inboxes. */
export function NotificationsPage({ permissions }: { permissions: NotificationPermissions }) {
  const [params, setParams] = useSearchParams();
  const tabs = tabsFor(permissions);
  const requested = params.get("tab") as Tab | null;
  const tab: Tab = requested && tabs.includes(requested) ? requested : "on-call";
  const settings = useNotifySettings(permissions.canReadContacts);
  const officeTimeZone = settings.data?.officeTimeZone ?? "America/Chicago";

  return (
    <>
      <PageHeader title="Notifications" description="Who is told about triggers, over which channel, and what reached them. Demo people and partners are invented." />
      <div role="tablist" aria-label="Notification areas" className="mb-4 flex flex-wrap gap-1 border-b border-line">
        {tabs.map((t) => (
          <button
            key={t}
            role="tab"
            type="button"
            aria-selected={t === tab}
            onClick={() => setParams(t === "on-call" ? {} : { tab: t }, { replace: true })}
            className={`-mb-px border-b-2 px-3 py-1.5 text-sm ${t === tab ? "border-accent font-medium text-ink" : "border-transparent text-muted hover:text-ink"}`}
          >
            {TAB_LABELS[t]}
          </button>
        ))}
      </div>
      <div role="tabpanel" aria-label={TAB_LABELS[tab]}>
        <SectionBoundary label={TAB_LABELS[tab]} resetKey={tab}>
          {tab === "on-call" && <OnCallPanel canWrite={permissions.canWriteOnCall && permissions.canReadContacts} />}
          {tab === "contacts" && <ContactsPanel canWrite={permissions.canWriteContacts} canLinkAccounts={permissions.canLinkAccounts} officeTimeZone={officeTimeZone} />}
          {tab === "groups" && <GroupsPanel canWrite={permissions.canWriteContacts} />}
          {tab === "templates" && <TemplatesPanel canWrite={permissions.canWriteSettings} />}
          {tab === "inboxes" && <FakeInboxesPanel />}
        </SectionBoundary>
      </div>
    </>
  );
}
