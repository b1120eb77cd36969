import { StrictMode } from "react";
import { createRoot } from "react-dom/client";
import { RouterProvider } from "react-router-dom";
import { AppProvider } from "./app/provider.tsx";
import { createAppRouter, sendToSignIn, type AppRouter } from "./app/router.tsx";
import { createQueryClient } from "./lib/query-client.ts";
import { applyTheme, initialTheme } from "./lib/theme.tsx";
import "./styles/fonts.css";
import "./styles/index.css";

// Set the theme before the first paint so a light-theme user never sees a dark flash.
applyTheme(initialTheme());

// The query client reports lost sessions; the router (created next) acts on them.
let router: AppRouter;
const queryClient = createQueryClient({ onUnauthenticated: () => sendToSignIn(router, queryClient) });
router = createAppRouter(queryClient);

const container = document.getElementById("root");
if (!container) throw new Error("index.html has no #root element");

createRoot(container).render(
  <StrictMode>
    <AppProvider queryClient={queryClient}>
      <RouterProvider router={router} />
    </AppProvider>
  </StrictMode>,
);
