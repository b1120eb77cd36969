import { HistoryPage } from "@/features/history/components/history-page.tsx";

/** Lazy route module: React Router picks up `Component`. */
export function Component() {
  return <HistoryPage />;
}
