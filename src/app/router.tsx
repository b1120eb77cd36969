import type { QueryClient } from "@tanstack/react-query";
import { createBrowserRouter, redirect, type LoaderFunctionArgs } from "react-router-dom";
import { NotFound } from "@/components/errors/not-found.tsx";
import { RouteError } from "@/components/errors/route-error.tsx";
import { Loading } from "@/components/ui/loading.tsx";
import { loginPathFor, paths, safeNextPath } from "@/config/paths.ts";
import { currentUserQuery, sessionKeys } from "@/lib/auth.ts";
import { RequirePermission } from "./require-permission.tsx";
import { AppRoot } from "./routes/app-root.tsx";
import { OverviewRoute } from "./routes/overview.tsx";
import { SignInRoute } from "./routes/sign-in.tsx";

/** Shown for the moment the first session check takes. */
function StartingUp() {
  return <Loading label="Starting Bellwether…" />;
}

function pathOf(request: Request): string {
  const url = new URL(request.url);
  return url.pathname + url.search;
}

/** Signed-in area guard: no session sends the user to sign in, remembering where they were going. */
function requireSession(queryClient: QueryClient) {
  return async ({ request }: LoaderFunctionArgs) => {
    const user = await queryClient.ensureQueryData(currentUserQuery());
    if (!user) throw redirect(loginPathFor(pathOf(request)));
    return null;
  };
}

/** The sign-in page is skipped when a session already exists. */
function skipSignInWhenSignedIn(queryClient: QueryClient) {
  return async ({ request }: LoaderFunctionArgs) => {
    try {
      const user = await queryClient.ensureQueryData(currentUserQuery());
      if (user) throw redirect(safeNextPath(new URL(request.url).searchParams.get("next")));
    } catch (error) {
      if (error instanceof Response) throw error;
      // Server unreachable: still show the form, which reports the failure when used.
    }
    return null;
  };
}

export function createAppRouter(queryClient: QueryClient) {
  return createBrowserRouter([
    {
      path: paths.login,
      loader: skipSignInWhenSignedIn(queryClient),
      element: <SignInRoute />,
      errorElement: <RouteError />,
      hydrateFallbackElement: <StartingUp />,
    },
    {
      id: "signed-in",
      loader: requireSession(queryClient),
      element: <AppRoot />,
      errorElement: <RouteError />,
      hydrateFallbackElement: <StartingUp />,
      children: [
        {
          // Pathless so a failing page shows its error inside the layout, keeping menu and header.
          errorElement: <RouteError />,
          children: [
            {
              // The timeline is the home page; its area guard reads the navigation list like every other.
              element: <RequirePermission area="timeline" />,
              children: [
                { index: true, lazy: () => import("./routes/timeline.tsx") },
                { path: `${paths.triggers}/:triggerId`, lazy: () => import("./routes/trigger.tsx") },
              ],
            },
            { path: paths.overview, element: <OverviewRoute /> },
            {
              path: paths.grids,
              element: <RequirePermission area="grids" />,
              children: [
                { index: true, lazy: () => import("./routes/grids.tsx") },
                { path: "frames/:frameId", lazy: () => import("./routes/grid-frame.tsx") },
              ],
            },
            {
              path: paths.soundings,
              element: <RequirePermission area="soundings" />,
              children: [{ index: true, lazy: () => import("./routes/soundings.tsx") }],
            },
            {
              path: paths.rules,
              element: <RequirePermission area="rules" />,
              children: [
                { index: true, lazy: () => import("./routes/rules.tsx") },
                { path: "new", lazy: () => import("./routes/rule-new.tsx") },
                { path: ":ruleId", lazy: () => import("./routes/rule-detail.tsx") },
                { path: ":ruleId/history", lazy: () => import("./routes/rule-history.tsx") },
                { path: ":ruleId/backtest", lazy: () => import("./routes/rule-backtest.tsx") },
              ],
            },
            {
              path: paths.zones,
              element: <RequirePermission area="zones" />,
              children: [{ index: true, lazy: () => import("./routes/zones.tsx") }],
            },
            {
              path: paths.notifications,
              element: <RequirePermission area="notifications" />,
              children: [{ index: true, lazy: () => import("./routes/notifications.tsx") }],
            },
            {
              path: paths.accounts,
              element: <RequirePermission area="accounts" />,
              children: [{ index: true, lazy: () => import("./routes/accounts.tsx") }],
            },
            {
              path: paths.history,
              element: <RequirePermission area="history" />,
              children: [
                { index: true, lazy: () => import("./routes/history.tsx") },
                { path: "report", lazy: () => import("./routes/history-report.tsx") },
              ],
            },
            {
              path: paths.verification,
              element: <RequirePermission area="verification" />,
              children: [{ index: true, lazy: () => import("./routes/verification.tsx") }],
            },
            {
              path: paths.audit,
              element: <RequirePermission area="audit" />,
              children: [{ index: true, lazy: () => import("./routes/audit.tsx") }],
            },
            { path: "*", element: <NotFound /> },
          ],
        },
      ],
    },
  ]);
}

export type AppRouter = ReturnType<typeof createAppRouter>;

/**
 * What happens when any request answers 401: forget the session and let the router take the user
 * to sign in, with a way back to the page they were on. No full-page reload.
 */
export function sendToSignIn(router: AppRouter, queryClient: QueryClient): void {
  const { pathname, search } = router.state.location;
  if (pathname === paths.login) return;
  queryClient.setQueryData(sessionKeys.me(), null);
  void router.navigate(loginPathFor(pathname + search), { replace: true });
}
