import { Link, useLocation } from "react-router-dom";

export function NotFound() {
  const { pathname } = useLocation();
  return (
    <section aria-labelledby="not-found-title" className="mx-auto mt-10 max-w-xl rounded-md border border-line bg-surface p-5">
      <h1 id="not-found-title" className="text-base font-semibold">
        Page not found
      </h1>
      <p className="mt-1 text-muted">
        Nothing lives at <code className="font-mono text-ink">{pathname}</code>. The link may be old or mistyped.
      </p>
      <Link to="/" className="mt-4 inline-block text-accent underline underline-offset-2">
        Back to the overview
      </Link>
    </section>
  );
}
