import { EventReportPage } from "@/features/history/components/event-report-page.tsx";

/** Lazy route module: React Router picks up `Component`. */
export function Component() {
  return <EventReportPage />;
}
