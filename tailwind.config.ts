import type { Config } from "tailwindcss";

import { palette } from "./components/brand/palette";

// Loaded from app/globals.css with `@config "../tailwind.config.ts";` (Tailwind 4 reads legacy
// configs through that directive only).
//
// WCAG 2.2 AA contrast of the main pairs (computed by components/brand/contrast.ts and checked
// in tests/unit/ui/palette-contrast.test.ts; text needs 4.5:1, control edges and focus rings 3:1):
//   ink on paper-100 (body text)           13.43:1   ink-soft on paper-100 (hints)      7.31:1
//   moss-800 on paper-100 (headings)       11.14:1   dusk-700 on paper-100 (links)      9.11:1
//   bark-900 on ember-400 (primary button)  7.33:1   ember-600 edge on paper-100        3.64:1
//   moss-800 on paper-50 (secondary)       11.92:1   paper-50 on berry-600 (danger)     6.95:1
//   bark-400 input border on paper-50       3.80:1   berry-700 error text on paper-100  8.51:1
//   dusk-500 focus ring on paper-100        5.17:1   ember-300 focus ring on moss-900   8.56:1
//   bark-500 placeholder on paper-50        5.61:1   paper-200 on moss-900 (footer)    11.87:1
//   badges (x-800/900 on x-100/200)   8.12–9.68:1   moss-600 progress on paper-300     5.27:1
export default {
  content: ["./app/**/*.{ts,tsx,mdx}", "./components/**/*.{ts,tsx}", "./emails/**/*.{ts,tsx}"],
  theme: {
    extend: {
      colors: palette,
      fontFamily: {
        display: ["var(--font-display)", "Georgia", "Cambria", "serif"],
        body: ["var(--font-body)", "system-ui", "Segoe UI", "Arial", "sans-serif"],
        sans: ["var(--font-body)", "system-ui", "Segoe UI", "Arial", "sans-serif"],
      },
      // Our own scale: a 17 px body (Atkinson Hyperlegible reads small at 16 px) and steps of
      // roughly 1.18 up to display sizes, with line heights loosened for long care guides.
      fontSize: {
        xs: ["0.8125rem", { lineHeight: "1.25rem" }],
        sm: ["0.9375rem", { lineHeight: "1.375rem" }],
        base: ["1.0625rem", { lineHeight: "1.65rem" }],
        lg: ["1.25rem", { lineHeight: "1.8rem" }],
        xl: ["1.5rem", { lineHeight: "2rem" }],
        "2xl": ["1.75rem", { lineHeight: "2.25rem" }],
        "3xl": ["2.125rem", { lineHeight: "2.5rem" }],
        "4xl": ["2.5rem", { lineHeight: "2.875rem" }],
        "5xl": ["3rem", { lineHeight: "3.25rem" }],
        "6xl": ["3.625rem", { lineHeight: "1.05" }],
      },
      boxShadow: {
        card: "0 1px 0 rgb(45 33 24 / 0.04), 0 1px 3px rgb(45 33 24 / 0.08)",
        lift: "0 2px 4px rgb(45 33 24 / 0.06), 0 12px 28px -8px rgb(45 33 24 / 0.22)",
      },
      keyframes: {
        "rise-in": {
          from: { opacity: "0", transform: "translateY(0.5rem)" },
          to: { opacity: "1", transform: "translateY(0)" },
        },
      },
      animation: { "rise-in": "rise-in 180ms ease-out" },
      maxWidth: { prose: "68ch", page: "76rem" },
    },
  },
} satisfies Config;
