/** A quiet loading line; announced politely so screen readers know something is on its way. */
export function Loading({ label = "Loading…" }: { label?: string }) {
  return (
    <p role="status" aria-live="polite" className="py-6 text-center text-muted">
      {label}
    </p>
  );
}
