import { isRouteErrorResponse, useNavigate, useRouteError } from "react-router-dom";
import { describeError } from "@/lib/describe-error.ts";
import { Button } from "../ui/button.tsx";

/** The router's error element: one failing page shows this while the header and menu stay put. */
export function RouteError() {
  const error = useRouteError();
  const navigate = useNavigate();
  const { message, reference } = isRouteErrorResponse(error)
    ? { message: `${error.status} ${error.statusText}`, reference: undefined }
    : describeError(error);
  return (
    <div role="alert" className="mx-auto mt-10 max-w-xl rounded-md border border-danger/50 bg-surface p-5">
      <h1 className="text-base font-semibold">This page could not be shown</h1>
      <p className="mt-1 text-muted">{message}</p>
      {reference && <p className="mt-1 font-mono text-xs text-muted">Request {reference}</p>}
      <div className="mt-4 flex gap-2">
        <Button variant="primary" onClick={() => navigate(0)}>
          Reload the page
        </Button>
        <Button onClick={() => navigate("/")}>Go to the overview</Button>
      </div>
    </div>
  );
}
