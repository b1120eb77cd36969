import { Fragment, useId, useLayoutEffect, useMemo, useRef, useState, type KeyboardEvent, type ReactNode } from "react";
import { applyCompletion, completionsAt, type CompletionResult } from "../expression/expression-completions.ts";

/** One problem to underline: a 0-based character range in the text as typed. */
export interface ExpressionProblem {
  message: string;
  position: number;
  length: number;
}

interface OpenList {
  result: CompletionResult;
  active: number;
}

interface Props {
  label: string;
  value: string;
  onChange: (value: string) => void;
  onBlur?: () => void;
  problems: readonly ExpressionProblem[];
  /** Hidden until the user has typed something, so a new rule does not open with a complaint. */
  showProblems: boolean;
  readOnly?: boolean;
  hint?: ReactNode;
}

// Textarea and backdrop must lay text out identically, or the underline drifts from the characters.
const TEXT_LAYOUT = "px-2.5 py-2 font-mono text-sm leading-6 whitespace-pre-wrap break-words border";

/** The backdrop's pieces: plain text, problem spans (underlined) and the caret marker for the list's position. */
function backdropPieces(text: string, problems: readonly ExpressionProblem[], caret: number) {
  const marked = new Uint8Array(text.length + 1);
  for (const p of problems) {
    const start = Math.max(0, Math.min(p.position, text.length));
    // A zero-length problem (something missing at the end) still gets one visible cell.
    const end = Math.max(start + 1, Math.min(text.length + 1, p.position + p.length));
    marked.fill(1, start, end);
  }
  const padded = `${text} `;
  const cuts = new Set([0, padded.length, Math.min(caret, text.length)]);
  for (let i = 1; i < padded.length; i++) if (marked[i] !== marked[i - 1]) cuts.add(i);
  const sorted = [...cuts].sort((a, b) => a - b);
  const pieces: Array<{ text: string; marked: boolean; caretBefore: boolean }> = [];
  for (let k = 0; k < sorted.length - 1; k++) {
    const from = sorted[k]!;
    pieces.push({ text: padded.slice(from, sorted[k + 1]), marked: marked[from] === 1, caretBefore: from === caret });
  }
  return pieces;
}

/**
 * The rule expression box: monospace text with every problem underlined where it is, and a list of
 * catalogue fields, functions and category labels that follows the cursor (arrows to move, Enter or
 * Tab to take one, Escape to close, Ctrl+Space to ask for it).
 */
export function ExpressionEditor({ label, value, onChange, onBlur, problems, showProblems, readOnly = false, hint }: Props) {
  const id = useId();
  const listId = `${id}-list`;
  const problemsId = `${id}-problems`;
  const hintId = `${id}-hint`;
  const textarea = useRef<HTMLTextAreaElement>(null);
  const caretMark = useRef<HTMLSpanElement>(null);
  const pendingCursor = useRef<number | null>(null);
  const [caret, setCaret] = useState(0);
  const [list, setList] = useState<OpenList | null>(null);
  const [listAt, setListAt] = useState({ top: 0, left: 0 });
  const shown = showProblems ? problems : [];
  const pieces = useMemo(() => backdropPieces(value, shown, caret), [value, shown, caret]);

  // Grow with the text (so the backdrop never has to follow a scroll), and put the cursor where a completion left it.
  useLayoutEffect(() => {
    const box = textarea.current;
    if (!box) return;
    box.style.height = "auto";
    box.style.height = `${box.scrollHeight + 2}px`;
    if (pendingCursor.current !== null) {
      box.setSelectionRange(pendingCursor.current, pendingCursor.current);
      pendingCursor.current = null;
    }
  }, [value]);

  useLayoutEffect(() => {
    const mark = caretMark.current;
    if (list && mark) setListAt({ top: mark.offsetTop + mark.offsetHeight, left: Math.min(mark.offsetLeft, Math.max(0, (textarea.current?.clientWidth ?? 0) - 384)) });
  }, [list, caret]);

  useLayoutEffect(() => {
    if (list) document.getElementById(`${listId}-${list.active}`)?.scrollIntoView({ block: "nearest" });
  }, [list, listId]);

  function suggest(text: string, cursor: number, explicit: boolean) {
    const result = readOnly ? null : completionsAt(text, cursor, { explicit });
    setList(result ? { result, active: 0 } : null);
  }

  function accept(index: number) {
    if (!list) return;
    const next = applyCompletion(value, list.result, list.result.items[index]!);
    pendingCursor.current = next.cursor;
    setCaret(next.cursor);
    setList(null);
    onChange(next.text);
  }

  function onKeyDown(event: KeyboardEvent<HTMLTextAreaElement>) {
    if (event.key === " " && event.ctrlKey) {
      event.preventDefault();
      suggest(value, event.currentTarget.selectionStart, true);
      return;
    }
    if (!list) return;
    const count = list.result.items.length;
    if (event.key === "ArrowDown" || event.key === "ArrowUp") {
      event.preventDefault();
      setList({ ...list, active: (list.active + (event.key === "ArrowDown" ? 1 : count - 1)) % count });
    } else if (event.key === "Enter" || event.key === "Tab") {
      event.preventDefault();
      accept(list.active);
    } else if (event.key === "Escape") {
      // Closing the list must not also close a surrounding dialog.
      event.preventDefault();
      event.stopPropagation();
      setList(null);
    }
  }

  const activeId = list ? `${listId}-${list.active}` : undefined;
  const describedBy = [hint ? hintId : null, shown.length ? problemsId : null].filter(Boolean).join(" ") || undefined;

  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="text-xs font-medium text-muted">
        {label}
      </label>
      <div className="relative rounded bg-canvas">
        <div aria-hidden="true" className={`pointer-events-none absolute inset-0 border-transparent text-transparent ${TEXT_LAYOUT}`}>
          {pieces.map((piece, k) => (
            <Fragment key={k}>
              {piece.caretBefore && <span ref={caretMark} />}
              {piece.marked ? <mark className="rounded-sm bg-danger/15 text-transparent underline decoration-danger decoration-wavy decoration-2 underline-offset-4">{piece.text}</mark> : piece.text}
            </Fragment>
          ))}
        </div>
        <textarea
          ref={textarea}
          id={id}
          rows={2}
          value={value}
          readOnly={readOnly}
          spellCheck={false}
          autoComplete="off"
          autoCapitalize="off"
          role="combobox"
          aria-autocomplete="list"
          aria-expanded={list !== null}
          aria-controls={listId}
          aria-activedescendant={activeId}
          aria-invalid={shown.length > 0 ? true : undefined}
          aria-describedby={describedBy}
          onChange={(event) => {
            const cursor = event.target.selectionStart;
            setCaret(cursor);
            onChange(event.target.value);
            suggest(event.target.value, cursor, false);
          }}
          onKeyDown={onKeyDown}
          onSelect={(event) => setCaret(event.currentTarget.selectionStart)}
          onClick={() => setList(null)}
          onBlur={() => {
            setList(null);
            onBlur?.();
          }}
          className={`relative block w-full resize-none overflow-hidden rounded bg-transparent text-ink caret-ink ${TEXT_LAYOUT} ${
            shown.length ? "border-danger" : "border-line"
          } ${readOnly ? "text-muted" : ""}`}
        />
        <ul
          id={listId}
          role="listbox"
          aria-label="Suggestions"
          hidden={list === null}
          style={{ top: listAt.top + 4, left: listAt.left }}
          className="absolute z-20 max-h-64 w-96 overflow-y-auto rounded border border-line bg-raised py-1 shadow-xl"
        >
          {list?.result.items.map((item, k) => (
            <li
              key={item.label}
              id={`${listId}-${k}`}
              role="option"
              aria-selected={k === list.active}
              // mousedown, not click: the textarea must keep focus (its blur would close the list first).
              onMouseDown={(event) => {
                event.preventDefault();
                accept(k);
              }}
              className={`flex cursor-pointer flex-col px-2.5 py-1 ${k === list.active ? "bg-accent/15" : "hover:bg-surface"}`}
            >
              <span className="flex items-center gap-2">
                <span className="font-mono text-sm text-ink">{item.kind === "function" ? `${item.label}()` : item.label}</span>
                <span className="text-[10px] tracking-wide text-muted uppercase">{item.group ?? item.kind}</span>
              </span>
              <span className="truncate text-xs text-muted">{item.detail}</span>
            </li>
          ))}
        </ul>
      </div>
      {hint && (
        <p id={hintId} className="text-xs text-muted">
          {hint}
        </p>
      )}
      {shown.length > 0 && (
        <ul id={problemsId} aria-live="polite" className="flex flex-col gap-0.5 text-xs text-danger">
          {shown.map((p, k) => (
            <li key={`${k}-${p.position}`}>
              <button
                type="button"
                className="text-left hover:underline"
                onClick={() => {
                  textarea.current?.focus();
                  textarea.current?.setSelectionRange(p.position, p.position + p.length);
                }}
              >
                {p.message} <span className="text-muted">(at character {p.position + 1})</span>
              </button>
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
