import type { NavItem } from "@/config/navigation.ts";
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

export function ShortcutHelpDialog({ open, onClose, items }: { open: boolean; onClose: () => void; items: readonly NavItem[] }) {
  return (
    <Dialog open={open} onClose={onClose} title="Keyboard shortcuts" description="Shortcuts do nothing while you are typing in a field." width="sm">
      <table className="w-full">
        <caption className="sr-only">Keyboard shortcuts</caption>
        <tbody>
          {items.map((item) => (
            <tr key={item.id} className="border-b border-line last:border-0">
              <td className="py-1.5">Go to {item.label}</td>
              <td className="py-1.5">
                <Keys keys={[CHORD_PREFIX, item.shortcut]} />
              </td>
            </tr>
          ))}
          <tr>
            <td className="py-1.5">Show this list</td>
            <td className="py-1.5">
              <Keys keys={["?"]} />
            </td>
          </tr>
          <tr>
            <td className="py-1.5">Close a dialog</td>
            <td className="py-1.5">
              <Keys keys={["Esc"]} />
            </td>
          </tr>
        </tbody>
      </table>
    </Dialog>
  );
}
