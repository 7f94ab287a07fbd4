// Roostwright's own colour palette: field-guide paper, forest moss, bark, dusk sky, an ember
// amber for actions and a berry red for warnings. Shared by tailwind.config.ts, the SVG
// illustrations and the contrast test (tests/unit/ui/palette-contrast.test.ts), so a colour
// changed here is re-checked against WCAG 2.2 AA before it ships. Values: our own, picked by eye.

export const palette = {
  paper: { 50: "#fdfbf6", 100: "#f8f3e8", 200: "#efe6d3", 300: "#e2d5ba" },
  ink: { DEFAULT: "#1f2a22", soft: "#4a5249" },
  moss: {
    50: "#eef4ee",
    100: "#d6e5d6",
    200: "#b0cdb1",
    300: "#84ae87",
    400: "#5b8e60",
    500: "#3f7346",
    600: "#2f5d37",
    700: "#254b2d",
    800: "#1d3b24",
    900: "#162d1c",
  },
  bark: {
    50: "#f6f1ec",
    100: "#e9ddd1",
    200: "#d4bea8",
    300: "#b99a7c",
    400: "#9c7a5b",
    500: "#7f5f43",
    600: "#664b34",
    700: "#523c2a",
    800: "#3f2e21",
    900: "#2d2118",
  },
  dusk: {
    50: "#eef2f8",
    100: "#d9e2ef",
    200: "#b5c6de",
    300: "#8aa4c8",
    400: "#6482b0",
    500: "#4a6796",
    600: "#3b537b",
    700: "#2f4264",
    800: "#25344f",
    900: "#1b263a",
  },
  ember: {
    50: "#fff7e8",
    100: "#feeac4",
    200: "#fcd58a",
    300: "#f8bb4f",
    400: "#f0a12a",
    500: "#d98a14",
    600: "#b46f0d",
    700: "#8e560e",
    800: "#6e4311",
    900: "#533311",
  },
  berry: {
    50: "#fcf0ef",
    100: "#f8dcd9",
    200: "#efb6b0",
    300: "#e2877e",
    400: "#d15e54",
    500: "#b8443b",
    600: "#9a352e",
    700: "#7c2b26",
    800: "#5f2220",
    900: "#461a19",
  },
} as const;

export type Palette = typeof palette;
