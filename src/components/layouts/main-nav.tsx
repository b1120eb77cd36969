import { NavLink } from "react-router-dom";
import type { NavItem } from "@/config/navigation.ts";
import { CHORD_PREFIX } from "@/lib/key-chords.ts";

/** The main menu; only the items the signed-in roles may use are passed in. */
export function MainNav({ items }: { items: readonly NavItem[] }) {
  return (
    <nav aria-label="Main" className="w-52 shrink-0 border-r border-line bg-surface px-2 py-3">
      <ul className="flex flex-col gap-0.5">
        {items.map((item) => (
          <li key={item.id}>
            <NavLink
              to={item.path}
              end={item.path === "/"}
              className={({ isActive }) =>
                `flex items-center justify-between rounded px-2.5 py-1.5 ${
                  isActive ? "bg-raised font-medium text-ink" : "text-muted hover:bg-raised hover:text-ink"
                }`
              }
            >
              {({ isActive }) => (
                <>
                  <span className="flex items-center gap-2">
                    <span aria-hidden="true" className={`h-4 w-0.5 rounded ${isActive ? "bg-accent" : "bg-transparent"}`} />
                    {item.label}
                  </span>
                  {/* Drawn by CSS so the hint stays out of the link's text and accessible name. */}
                  <span
                    aria-hidden="true"
                    data-keys={`${CHORD_PREFIX} ${item.shortcut}`}
                    className="font-mono text-[10px] text-muted after:content-[attr(data-keys)]"
                  />
                </>
              )}
            </NavLink>
          </li>
        ))}
      </ul>
    </nav>
  );
}
