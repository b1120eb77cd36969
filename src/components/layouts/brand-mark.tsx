/** Bellwether's mark: a plain bell outline. */
export function BrandMark({ className = "" }: { className?: string }) {
  return (
    <svg viewBox="0 0 24 24" aria-hidden="true" className={className} fill="none" stroke="currentColor" strokeWidth="1.8" strokeLinejoin="round">
      <path d="M12 3.5c-3 0-5.2 2.3-5.2 5.3v3.4L4.8 16h14.4l-2-3.8V8.8c0-3-2.2-5.3-5.2-5.3Z" />
      <path d="M9.8 18.6a2.3 2.3 0 0 0 4.4 0" strokeLinecap="round" />
    </svg>
  );
}
