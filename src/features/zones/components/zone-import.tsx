import { useId, useRef, useState } from "react";
import { Button } from "@/components/ui/button.tsx";
import { Notice } from "@/components/ui/notice.tsx";
import { useToast } from "@/components/ui/toaster.tsx";
import { formatCount } from "@/lib/format-units.ts";
import { refusalProblems } from "@/lib/refusal-problems.ts";
import { useImportZones } from "../api/import-zones.ts";

/**
 * Import of a GeoJSON FeatureCollection file: each feature's properties carry `code` and `name`. The
 * server takes all of them or none; when it refuses, every problem it named is listed here, so the
 * file can be fixed in one go.
 */
export function ZoneImport() {
  const inputId = useId();
  const input = useRef<HTMLInputElement>(null);
  const importZones = useImportZones();
  const toast = useToast();
  const [refused, setRefused] = useState<{ file: string; problems: string[] } | null>(null);

  function send(file: File | undefined) {
    if (!file) return;
    setRefused(null);
    importZones.mutate(file, {
      onSuccess: (zones) => toast.success(`${formatCount(zones.length, "zone")} imported`, zones.map((z) => z.code).join(", ")),
      onError: (error) => setRefused({ file: file.name, problems: refusalProblems(error) }),
      onSettled: () => {
        if (input.current) input.current.value = "";
      },
    });
  }

  return (
    <div className="flex flex-col gap-2">
      <div className="flex flex-wrap items-center gap-3">
        <input
          ref={input}
          id={inputId}
          type="file"
          accept=".geojson,.json,application/geo+json,application/json"
          className="peer sr-only"
          disabled={importZones.isPending}
          onChange={(event) => send(event.target.files?.[0])}
        />
        <label
          htmlFor={inputId}
          className={`inline-flex h-9 cursor-pointer items-center rounded border border-line bg-raised px-3.5 text-sm font-medium hover:border-muted peer-focus-visible:outline-2 peer-focus-visible:outline-offset-2 peer-focus-visible:outline-focus ${
            importZones.isPending ? "pointer-events-none opacity-50" : ""
          }`}
        >
          Import GeoJSON…
        </label>
        <p className="text-xs text-muted" aria-live="polite">
          {importZones.isPending
            ? "Checking the file…"
            : "A FeatureCollection of Polygons or MultiPolygons, each with properties.code and properties.name. All or nothing."}
        </p>
      </div>
      {refused && (
        <Notice tone="danger" title={`${refused.file} was refused: nothing was imported`}>
          <ul className="list-disc pl-5" aria-label="Problems in the file">
            {refused.problems.map((problem) => (
              <li key={problem}>{problem}</li>
            ))}
          </ul>
          <Button size="sm" variant="ghost" className="mt-1" onClick={() => setRefused(null)}>
            Dismiss
          </Button>
        </Notice>
      )}
    </div>
  );
}
