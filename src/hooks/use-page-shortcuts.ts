import { useEffect, useSyncExternalStore } from "react";
import { pageShortcuts, type PageShortcut } from "@/lib/page-shortcuts.ts";

/** Lists a page's own keys in the shortcut help while the page is mounted (pass a constant array). */
export function usePageShortcuts(shortcuts: readonly PageShortcut[]): void {
  useEffect(() => pageShortcuts.register(shortcuts), [shortcuts]);
}

/** The keys the open pages have registered. */
export function useRegisteredPageShortcuts(): readonly PageShortcut[] {
  return useSyncExternalStore(pageShortcuts.subscribe, pageShortcuts.list, pageShortcuts.list);
}
