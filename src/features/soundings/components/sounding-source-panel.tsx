import { useId, useRef, useState, type DragEvent } from "react";
import { DEMO_SOUNDINGS } from "@shared/demo/soundings.ts";
import { MAX_SOUNDING_CSV_BYTES } from "@shared/api/soundings.ts";
import { SOUNDING_CSV_HEADER } from "@shared/sounding/csv.ts";
import { Button } from "@/components/ui/button.tsx";
import { Notice } from "@/components/ui/notice.tsx";
import { Panel } from "@/components/ui/panel.tsx";
import type { SoundingSubmission } from "../api/report-sounding.ts";
import { lineRange, type SoundingProblem } from "../sounding-error.ts";

type Origin = SoundingSubmission["origin"];

/**
 * The three ways in: an invented demo sounding, a CSV file (chosen or dropped), or pasted text. A failure is
 * shown beside the input it came from, with a button that selects the offending line in the text box.
 */
export function SoundingSourcePanel({
  onSubmit,
  pending,
  problem,
  problemOrigin,
}: {
  onSubmit: (submission: SoundingSubmission) => void;
  pending: boolean;
  problem: (SoundingProblem & { label: string }) | null;
  problemOrigin: Origin | null;
}) {
  const ids = { demo: useId(), file: useId(), text: useId() };
  const [demoId, setDemoId] = useState(DEMO_SOUNDINGS[0].id);
  const [text, setText] = useState("");
  const [dragging, setDragging] = useState(false);
  const [localProblem, setLocalProblem] = useState<string | null>(null);
  const textRef = useRef<HTMLTextAreaElement>(null);

  const submitDemo = () => {
    const demo = DEMO_SOUNDINGS.find((d) => d.id === demoId) ?? DEMO_SOUNDINGS[0];
    setLocalProblem(null);
    onSubmit({ csv: demo.csv, label: demo.title, origin: "demo" });
  };

  const submitFile = async (file: File | undefined) => {
    if (!file) return;
    if (file.size > MAX_SOUNDING_CSV_BYTES) {
      setLocalProblem(`${file.name} is larger than 1 MB; a sounding file is a few kilobytes.`);
      return;
    }
    setLocalProblem(null);
    const csv = await file.text();
    // The file's text goes into the box too, so a reported line can be found and fixed in place.
    setText(csv);
    onSubmit({ csv, label: file.name, origin: "file" });
  };

  const onDrop = (event: DragEvent<HTMLElement>) => {
    event.preventDefault();
    setDragging(false);
    void submitFile(event.dataTransfer.files[0]);
  };

  const showLine = (line: number) => {
    const box = textRef.current;
    const range = lineRange(box?.value ?? "", line);
    if (!box || !range) return;
    box.focus();
    box.setSelectionRange(range.start, range.end);
    const lineHeight = parseFloat(getComputedStyle(box).lineHeight) || 18;
    box.scrollTop = Math.max(0, (line - 3) * lineHeight);
  };

  const problemNotice = (origin: Origin) =>
    problem && problemOrigin === origin ? (
      <Notice tone="danger" title={`Could not read ${problem.label}`}>
        <p className="font-mono text-xs [font-variant-ligatures:none]" data-testid="sounding-error">
          {problem.message}
        </p>
        {problem.line !== null && origin !== "demo" && (
          <Button size="sm" className="mt-1.5" onClick={() => showLine(problem.line!)}>
            Select line {problem.line} in the text
          </Button>
        )}
      </Notice>
    ) : null;

  return (
    <Panel title="Sounding">
      <div className="grid gap-5 lg:grid-cols-2">
        <div className="flex flex-col gap-4">
          <div className="flex flex-col gap-1">
            <label htmlFor={ids.demo} className="text-xs font-medium text-muted">
              Demo soundings (invented, not observations)
            </label>
            <div className="flex gap-2">
              <select id={ids.demo} value={demoId} onChange={(e) => setDemoId(e.target.value)} className="h-9 min-w-0 flex-1 rounded border border-line bg-canvas px-2 text-ink">
                {DEMO_SOUNDINGS.map((demo) => (
                  <option key={demo.id} value={demo.id}>
                    {demo.title}
                  </option>
                ))}
              </select>
              <Button onClick={submitDemo} disabled={pending}>
                Show
              </Button>
            </div>
            {problemNotice("demo")}
          </div>

          <div className="flex flex-col gap-1">
            <span className="text-xs font-medium text-muted">Upload a CSV file</span>
            <label
              htmlFor={ids.file}
              onDragOver={(e) => {
                e.preventDefault();
                setDragging(true);
              }}
              onDragLeave={() => setDragging(false)}
              onDrop={onDrop}
              className={`flex cursor-pointer flex-col items-center justify-center gap-1 rounded border border-dashed px-3 py-5 text-center transition-colors has-[:focus-visible]:outline-2 has-[:focus-visible]:outline-focus ${
                dragging ? "border-accent bg-accent/10" : "border-line bg-canvas hover:border-muted"
              }`}
            >
              <span>Drop a sounding file here, or choose one</span>
              <span className="text-xs text-muted">.csv in Bellwether's layout, up to 1 MB</span>
              <input
                id={ids.file}
                type="file"
                accept=".csv,text/csv,text/plain"
                className="sr-only"
                data-testid="sounding-file"
                disabled={pending}
                onChange={(e) => {
                  void submitFile(e.target.files?.[0]);
                  e.target.value = "";
                }}
              />
            </label>
            {localProblem && <Notice tone="danger">{localProblem}</Notice>}
            {problemNotice("file")}
          </div>
        </div>

        <form
          className="flex flex-col gap-1"
          onSubmit={(e) => {
            e.preventDefault();
            if (text.trim()) onSubmit({ csv: text, label: "the pasted text", origin: "paste" });
          }}
        >
          <label htmlFor={ids.text} className="text-xs font-medium text-muted">
            Or paste CSV text
          </label>
          <textarea
            id={ids.text}
            ref={textRef}
            value={text}
            onChange={(e) => setText(e.target.value)}
            rows={9}
            spellCheck={false}
            placeholder={`${SOUNDING_CSV_HEADER}\n1000,110,29.0,22.0,160,15\n…`}
            className="min-h-40 resize-y rounded border border-line bg-canvas px-2.5 py-2 font-mono text-xs leading-[18px] text-ink [font-variant-ligatures:none] placeholder:text-muted/70"
          />
          <p className="text-xs text-muted">
            Header <code>{SOUNDING_CSV_HEADER}</code>, one row per level from the surface up; wind cells may be left empty.
          </p>
          <div className="flex justify-end">
            <Button type="submit" variant="primary" disabled={pending || !text.trim()}>
              {pending ? "Computing…" : "Diagnose text"}
            </Button>
          </div>
          {problemNotice("paste")}
        </form>
      </div>
    </Panel>
  );
}
