import localFont from "next/font/local";

// Both faces ship with the app (copied from @fontsource/fraunces and
// @fontsource/atkinson-hyperlegible 5.3, latin subset, SIL OFL 1.1: see app/fonts/LICENSE-*).
// The Google-hosted font loader would download at build time, which this project cannot rely on.

/** Headings and display type: Fraunces, a soft old-style serif that suits a field guide. */
export const displayFont = localFont({
  src: [
    { path: "./fonts/fraunces-latin-400-normal.woff2", weight: "400", style: "normal" },
    { path: "./fonts/fraunces-latin-400-italic.woff2", weight: "400", style: "italic" },
    { path: "./fonts/fraunces-latin-600-normal.woff2", weight: "600", style: "normal" },
  ],
  variable: "--font-display",
  display: "swap",
  fallback: ["Georgia", "Cambria", "serif"],
});

/** Body text: Atkinson Hyperlegible, drawn for readers with low vision. */
export const bodyFont = localFont({
  src: [
    {
      path: "./fonts/atkinson-hyperlegible-latin-400-normal.woff2",
      weight: "400",
      style: "normal",
    },
    {
      path: "./fonts/atkinson-hyperlegible-latin-400-italic.woff2",
      weight: "400",
      style: "italic",
    },
    {
      path: "./fonts/atkinson-hyperlegible-latin-700-normal.woff2",
      weight: "700",
      style: "normal",
    },
  ],
  variable: "--font-body",
  display: "swap",
  fallback: ["system-ui", "Segoe UI", "Arial", "sans-serif"],
});
