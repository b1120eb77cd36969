import { createContext, useCallback, useContext, useMemo, useState, type ReactNode } from "react";

export type Theme = "dark" | "light";

/** Dark is the default: the app is made for dim operations rooms. */
export const DEFAULT_THEME: Theme = "dark";
export const THEME_STORAGE_KEY = "bellwether.theme";

interface KeyValueStore {
  getItem(key: string): string | null;
  setItem(key: string, value: string): void;
}

/** The remembered theme, or the default when none was stored (or storage is unavailable). */
export function readStoredTheme(storage: KeyValueStore | undefined): Theme {
  try {
    const value = storage?.getItem(THEME_STORAGE_KEY);
    return value === "light" || value === "dark" ? value : DEFAULT_THEME;
  } catch {
    return DEFAULT_THEME;
  }
}

function storeTheme(storage: KeyValueStore | undefined, theme: Theme): void {
  try {
    storage?.setItem(THEME_STORAGE_KEY, theme);
  } catch {
    // Private browsing can refuse storage; the choice then lasts for this visit only.
  }
}

/** Sets the attribute the CSS variables key on. Called before the first render to avoid a flash. */
export function applyTheme(theme: Theme): void {
  document.documentElement.dataset.theme = theme;
}

function browserStorage(): KeyValueStore | undefined {
  try {
    return window.localStorage;
  } catch {
    return undefined;
  }
}

interface ThemeContextValue {
  theme: Theme;
  setTheme: (theme: Theme) => void;
  toggleTheme: () => void;
}

const ThemeContext = createContext<ThemeContextValue | null>(null);

export function ThemeProvider({ children }: { children: ReactNode }) {
  const [theme, setThemeState] = useState<Theme>(() => readStoredTheme(browserStorage()));

  const setTheme = useCallback((next: Theme) => {
    setThemeState(next);
    applyTheme(next);
    storeTheme(browserStorage(), next);
  }, []);

  const value = useMemo<ThemeContextValue>(
    () => ({ theme, setTheme, toggleTheme: () => setTheme(theme === "dark" ? "light" : "dark") }),
    [theme, setTheme],
  );
  return <ThemeContext.Provider value={value}>{children}</ThemeContext.Provider>;
}

export function useTheme(): ThemeContextValue {
  const value = useContext(ThemeContext);
  if (!value) throw new Error("useTheme needs a ThemeProvider above it");
  return value;
}

/** Read once at start-up, before React renders. */
export function initialTheme(): Theme {
  return readStoredTheme(browserStorage());
}
