import type { Config } from "tailwindcss";

/**
 * Bellwether's design tokens. Colours point at CSS variables (src/styles/index.css) so the dark
 * and light themes swap by changing one attribute on <html>. Tailwind 4 reads this file only
 * through the `@config` line in the CSS entry.
 */
export default {
  content: ["./src/**/*.{html,ts,tsx}"],
  theme: {
    extend: {
      colors: {
        canvas: "var(--bw-canvas)",
        surface: "var(--bw-surface)",
        raised: "var(--bw-raised)",
        line: "var(--bw-line)",
        ink: "var(--bw-ink)",
        muted: "var(--bw-muted)",
        accent: "var(--bw-accent)",
        "accent-ink": "var(--bw-accent-ink)",
        focus: "var(--bw-focus)",
        ok: "var(--bw-ok)",
        caution: "var(--bw-caution)",
        danger: "var(--bw-danger)",
      },
      fontFamily: {
        sans: ["Inter", "system-ui", "sans-serif"],
        mono: ["JetBrains Mono", "ui-monospace", "monospace"],
      },
    },
  },
} satisfies Config;
