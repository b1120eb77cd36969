import { PageHeader } from "@/components/ui/page-header.tsx";
import { Panel } from "@/components/ui/panel.tsx";

/** Placeholder until the soundings screen is built. */
export function SoundingsPage() {
  return (
    <>
      <PageHeader title="Soundings" description="Vertical profiles and their severe-weather diagnostics." />
      <Panel>
        <p className="text-muted">
          This screen is being built. It will take a sounding (a file in Bellwether's CSV layout, or a grid column) and show
          its skew-T, hodograph and computed indices.
        </p>
      </Panel>
    </>
  );
}
