import { useId, useRef, useState, type DragEvent } from "react";
import { useToast } from "@/components/ui/toaster.tsx";
import { describeErrorLine } from "@/lib/describe-error.ts";
import { useUploadGridFile } from "../api/upload-grid-file.ts";
import { formatFileSize } from "../format-grid-labels.ts";

/**
 * Upload of model files by picker or drag and drop. Files go one after another; each becomes an
 * ingest job that the list below follows live. The server checks the type from the file's own
 * bytes, so no file is refused here by its name.
 */
export function UploadDropZone() {
  const inputId = useId();
  const input = useRef<HTMLInputElement>(null);
  const upload = useUploadGridFile();
  const toast = useToast();
  const [dragging, setDragging] = useState(false);
  const [current, setCurrent] = useState<File | null>(null);

  async function send(files: readonly File[]) {
    for (const file of files) {
      setCurrent(file);
      try {
        const { job, duplicate } = await upload.mutateAsync(file);
        if (duplicate) toast.info(`${file.name} was already received`, `The same file is job ${job.id} (${job.state}); it was not processed again.`);
        else toast.success(`${file.name} received`, `Queued as ingest job ${job.id}.`);
      } catch (error) {
        toast.error(`${file.name} was not accepted`, describeErrorLine(error));
      }
    }
    setCurrent(null);
    if (input.current) input.current.value = "";
  }

  const onDrop = (event: DragEvent<HTMLDivElement>) => {
    event.preventDefault();
    setDragging(false);
    if (!current) void send([...event.dataTransfer.files]);
  };

  return (
    <div
      onDragOver={(event) => {
        event.preventDefault();
        setDragging(true);
      }}
      onDragLeave={() => setDragging(false)}
      onDrop={onDrop}
      className={`flex flex-wrap items-center gap-3 rounded-md border border-dashed px-4 py-3 transition-colors ${
        dragging ? "border-accent bg-accent/10" : "border-line bg-surface"
      }`}
    >
      <input
        ref={input}
        id={inputId}
        type="file"
        multiple
        className="peer sr-only"
        disabled={current !== null}
        onChange={(event) => void send([...(event.target.files ?? [])])}
      />
      <label
        htmlFor={inputId}
        className={`inline-flex h-9 cursor-pointer items-center rounded border border-line bg-raised px-3.5 text-sm font-medium hover:border-muted peer-focus-visible:outline-2 peer-focus-visible:outline-offset-2 peer-focus-visible:outline-focus ${
          current ? "pointer-events-none opacity-50" : ""
        }`}
      >
        Upload grid files…
      </label>
      <p className="text-sm text-muted" aria-live="polite">
        {current ? (
          <>
            Sending <span className="font-mono text-ink">{current.name}</span> ({formatFileSize(current.size)})…
          </>
        ) : (
          "or drop GRIB2 or NetCDF files here. Each file becomes an ingest job below."
        )}
      </p>
    </div>
  );
}
