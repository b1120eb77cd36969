import { useEffect, useId, useRef, type ReactNode } from "react";

/**
 * A modal built on the native <dialog>: the browser traps focus, closes on Escape and marks
 * the rest of the page inert. `onClose` runs for Escape as well as the close button.
 */
export function Dialog({
  open,
  onClose,
  title,
  description,
  children,
  width = "md",
}: {
  open: boolean;
  onClose: () => void;
  title: string;
  description?: ReactNode;
  children: ReactNode;
  width?: "sm" | "md" | "lg";
}) {
  const ref = useRef<HTMLDialogElement>(null);
  const titleId = useId();
  const descriptionId = useId();

  useEffect(() => {
    const dialog = ref.current;
    if (!dialog) return;
    if (open && !dialog.open) dialog.showModal();
    if (!open && dialog.open) dialog.close();
  }, [open]);

  const widthClass = width === "sm" ? "max-w-sm" : width === "lg" ? "max-w-3xl" : "max-w-lg";
  return (
    <dialog
      ref={ref}
      aria-labelledby={titleId}
      aria-describedby={description ? descriptionId : undefined}
      onCancel={(event) => {
        event.preventDefault();
        onClose();
      }}
      className={`m-auto w-full ${widthClass} rounded-md border border-line bg-surface p-0 text-ink shadow-2xl`}
    >
      {open && (
        <div className="flex flex-col">
          <header className="flex items-start justify-between gap-3 border-b border-line px-5 py-3">
            <div>
              <h2 id={titleId} className="text-base font-semibold">
                {title}
              </h2>
              {description && (
                <p id={descriptionId} className="mt-0.5 text-muted">
                  {description}
                </p>
              )}
            </div>
            <button
              type="button"
              onClick={onClose}
              aria-label="Close"
              className="rounded px-1.5 text-lg leading-none text-muted hover:bg-raised hover:text-ink"
            >
              ×
            </button>
          </header>
          <div className="px-5 py-4">{children}</div>
        </div>
      )}
    </dialog>
  );
}
