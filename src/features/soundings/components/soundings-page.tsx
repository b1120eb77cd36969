import { useSearchParams } from "react-router-dom";
import { PageHeader } from "@/components/ui/page-header.tsx";
import { ModelColumnView } from "./model-column-view.tsx";
import { SoundingWorkbench } from "./sounding-workbench.tsx";

/** Link parameters that ask for a model column instead of a user's sounding. */
const COLUMN_PARAMS = ["frame", "lat", "lon"];

/**
 * The Soundings page: a sounding the user brings (demo, file or pasted CSV), or, when linked from the map with
 * `?frame=&lat=&lon=`, the model column nearest that point. Both show the skew-T, hodograph and column fields.
 */
export function SoundingsPage() {
  const [searchParams] = useSearchParams();
  const wantsColumn = COLUMN_PARAMS.some((key) => searchParams.has(key));
  return (
    <>
      <PageHeader
        title="Soundings"
        description={
          wantsColumn
            ? "A model column from a stored frame, diagnosed the same way the grid was."
            : "Pick a demo sounding, upload a CSV file or paste its text to see the skew-T, hodograph and every column field."
        }
      />
      {wantsColumn ? <ModelColumnView searchParams={searchParams} /> : <SoundingWorkbench />}
    </>
  );
}
