/**
 * Keys a page adds while it is open (the timeline's j / k / a), so the layout's shortcut help can
 * list them beside the navigation chords. A tiny store: pages register on mount and leave on unmount.
 */
export interface PageShortcut {
  label: string;
  keys: readonly string[];
}

export function createPageShortcutStore() {
  let groups: ReadonlyArray<readonly PageShortcut[]> = [];
  // Flattened once per change, so readers get the same array until something changes.
  let flat: readonly PageShortcut[] = [];
  const listeners = new Set<() => void>();
  const update = (next: ReadonlyArray<readonly PageShortcut[]>) => {
    groups = next;
    flat = next.flat();
    for (const listener of listeners) listener();
  };
  return {
    /** Adds a page's shortcuts; returns the function that removes them. */
    register(shortcuts: readonly PageShortcut[]): () => void {
      update([...groups, shortcuts]);
      return () => update(groups.filter((group) => group !== shortcuts));
    },
    /** Every registered shortcut, in registration order. */
    list: (): readonly PageShortcut[] => flat,
    subscribe(listener: () => void): () => void {
      listeners.add(listener);
      return () => listeners.delete(listener);
    },
  };
}

/** The tab's one store. */
export const pageShortcuts = createPageShortcutStore();
