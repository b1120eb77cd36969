import { SoundingsPage } from "@/features/soundings/components/soundings-page.tsx";

/** Lazy route module: React Router picks up `Component`. */
export function Component() {
  return <SoundingsPage />;
}
