import type { NavItem } from "@/config/navigation.ts";
import { useRegisteredPageShortcuts } from "@/hooks/use-page-shortcuts.ts";
import { CHORD_PREFIX } from "@/lib/key-chords.ts";
import { Dialog } from "../ui/dialog.tsx";

function Keys({ keys }: { keys: readonly string[] }) {
  return (
    <span className="flex gap-1">
      {keys.map((key, index) => (
        <kbd key={index} className="rounded border border-line bg-raised px-1.5 font-mono text-xs">
          {key}
        </kbd>
      ))}
    </span>
  );
}

/** Keys that do not come from the navigation list. */
const OTHER_SHORTCUTS: ReadonlyArray<{ label: string; keys: readonly string[] }> = [
  { label: "Show this list", keys: ["?"] },
  { label: "Close a dialog", keys: ["Esc"] },
];

export function ShortcutHelpDialog({ open, onClose, items }: { open: boolean; onClose: () => void; items: readonly NavItem[] }) {
  // Keys of the page that is open (the timeline's j / k / a) come after the navigation chords.
  const pageRows = useRegisteredPageShortcuts();
  const rows = [...items.map((item) => ({ label: `Go to ${item.label}`, keys: [CHORD_PREFIX, item.shortcut] })), ...pageRows, ...OTHER_SHORTCUTS];
  return (
    <Dialog open={open} onClose={onClose} title="Keyboard shortcuts" description="Shortcuts do nothing while you are typing in a field." width="sm">
      <table className="w-full">
        <caption className="sr-only">Keyboard shortcuts</caption>
        <tbody>
          {rows.map((row) => (
            <tr key={row.label} className="border-b border-line last:border-0">
              <td className="py-1.5">{row.label}</td>
              <td className="py-1.5">
                <Keys keys={row.keys} />
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </Dialog>
  );
}
