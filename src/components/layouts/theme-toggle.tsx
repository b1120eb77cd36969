import { useTheme } from "@/lib/theme.tsx";
import { Button } from "../ui/button.tsx";

export function ThemeToggle() {
  const { theme, toggleTheme } = useTheme();
  const next = theme === "dark" ? "light" : "dark";
  return (
    <Button variant="ghost" size="sm" onClick={toggleTheme} aria-label={`Switch to the ${next} theme`} title={`Switch to the ${next} theme`}>
      <span aria-hidden="true">{theme === "dark" ? "☾" : "☀"}</span>
      <span className="hidden sm:inline">{theme === "dark" ? "Dark" : "Light"}</span>
    </Button>
  );
}
