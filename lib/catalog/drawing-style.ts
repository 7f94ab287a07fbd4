import type { HouseSpec, Shade } from "./spec";
import { element, line, text } from "./svg-markup";

// Sizes, palette and small shared pieces of the house drawing (see drawing.ts).

export const WIDTH = 900;
export const HEIGHT = 600;
export const PALETTE = {
  forest: "#1f3a2e",
  bark: "#6b4f3a",
  paper: "#f7f3ea",
  dusk: "#2d4660",
  muted: "#5f6f66",
  wood: "#dcc7a8",
  slot: "#1c1b19",
} as const;
export const SHADE_FILL: Record<Shade, string> = {
  black: "#2f2e2b",
  dark: "#54443a",
  medium: "#8e7c68",
  light: "#cfc1aa",
  white: "#fbfaf5",
};
export const BOARD_IN = 0.5;
export const ROOF_IN = 1;
export const OVERHANG_IN = 0.75;
// Vents sit 6 in above the bottom of the front (Bat Conservation of Wisconsin, "Attracting Bats").
export const VENT_ABOVE_BOTTOM_IN = 6;
export const VENT_SLOT_IN = 0.5;
export const TOP = 115;
export const FRONT_CX = 220;
export const SIDE_CX = 690;
export const FONT = "Atkinson Hyperlegible, system-ui, sans-serif";

export type Scale = { s: number; yTop: number; yBottom: number; frontBottom: number; roof: number };

export function dimension(x1: number, y1: number, x2: number, y2: number): string {
  const vertical = x1 === x2;
  const tick = (x: number, y: number) =>
    vertical ? line(x - 4, y, x + 4, y) : line(x, y - 4, x, y + 4);
  return element(
    "g",
    { stroke: PALETTE.dusk, "stroke-width": 1 },
    line(x1, y1, x2, y2) + tick(x1, y1) + tick(x2, y2),
  );
}

export const dimText = (x: number, y: number, label: string, rotate = false, anchor = "middle") =>
  text(x, y, label, {
    fill: PALETTE.dusk,
    "font-size": 12,
    "text-anchor": anchor,
    transform: rotate
      ? `rotate(-90 ${Math.round(x * 10) / 10} ${Math.round(y * 10) / 10})`
      : undefined,
  });

export function roughening(spec: HouseSpec, ids: { mesh: string }) {
  if (spec.interiorSurface === "plastic-mesh" || spec.interiorSurface === "metal-mesh") {
    return { fill: `url(#${ids.mesh})`, spacingIn: null };
  }
  return {
    fill: "none",
    spacingIn: spec.interiorSurface === "grooved" ? (spec.grooveSpacingIn ?? 0.5) : null,
  };
}

export function grooveLines(
  x: number,
  width: number,
  yFrom: number,
  yTo: number,
  spacingPx: number,
): string {
  // Below about 3 px apart the lines merge into grey; draw every other one instead.
  const step = spacingPx < 3 ? spacingPx * Math.ceil(3 / spacingPx) : spacingPx;
  let out = "";
  for (let y = yFrom + step; y < yTo - 0.5; y += step) out += line(x, y, x + width, y);
  return element("g", { stroke: PALETTE.forest, "stroke-width": 0.5, opacity: 0.45 }, out);
}
