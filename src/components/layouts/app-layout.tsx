import { useMemo, useState, type ReactNode } from "react";
import { useNavigate } from "react-router-dom";
import type { Role } from "@shared/auth/permissions.ts";
import type { NavItem } from "@/config/navigation.ts";
import { useKeyChords } from "@/hooks/use-key-chords.ts";
import { Button } from "../ui/button.tsx";
import { RoleChips } from "../ui/role-chips.tsx";
import { BrandMark } from "./brand-mark.tsx";
import { MainNav } from "./main-nav.tsx";
import { ShortcutHelpDialog } from "./shortcut-help-dialog.tsx";
import { ThemeToggle } from "./theme-toggle.tsx";
import { UtcClock } from "./utc-clock.tsx";

export interface AppLayoutProps {
  user: { displayName: string; username: string; roles: readonly Role[] };
  navItems: readonly NavItem[];
  onSignOut: () => void;
  signingOut?: boolean;
  children: ReactNode;
}

/** The signed-in frame: header (name, clock, user, theme, sign-out), main menu, and the page. */
export function AppLayout({ user, navItems, onSignOut, signingOut = false, children }: AppLayoutProps) {
  const navigate = useNavigate();
  const [helpOpen, setHelpOpen] = useState(false);
  const bindings = useMemo(() => navItems.map(({ shortcut, path }) => ({ shortcut, path })), [navItems]);
  useKeyChords({ bindings, onNavigate: (path) => navigate(path), onHelp: () => setHelpOpen(true) });

  return (
    <div className="flex min-h-screen flex-col">
      <a
        href="#main"
        className="sr-only focus:not-sr-only focus:absolute focus:top-2 focus:left-2 focus:z-50 focus:rounded focus:bg-raised focus:px-3 focus:py-1.5"
      >
        Skip to content
      </a>
      <header className="flex h-12 shrink-0 items-center gap-4 border-b border-line bg-surface px-4">
        <div className="flex w-48 items-center gap-2">
          <BrandMark className="h-5 w-5 text-focus" />
          <span className="text-[15px] font-semibold tracking-wide">Bellwether</span>
        </div>
        <UtcClock />
        <div className="ml-auto flex items-center gap-3">
          <div className="hidden items-center gap-2 md:flex">
            <span className="sr-only">Signed in as</span>
            <span className="font-medium" title={user.username}>
              {user.displayName}
            </span>
            <RoleChips roles={user.roles} />
          </div>
          <Button variant="ghost" size="sm" onClick={() => setHelpOpen(true)} aria-label="Keyboard shortcuts" title="Keyboard shortcuts (?)">
            <kbd className="font-mono">?</kbd>
          </Button>
          <ThemeToggle />
          <Button size="sm" onClick={onSignOut} disabled={signingOut}>
            Sign out
          </Button>
        </div>
      </header>
      <div className="flex flex-1">
        <MainNav items={navItems} />
        <main id="main" tabIndex={-1} className="min-w-0 flex-1 px-6 py-5 focus:outline-none">
          {children}
        </main>
      </div>
      <ShortcutHelpDialog open={helpOpen} onClose={() => setHelpOpen(false)} items={navItems} />
    </div>
  );
}
