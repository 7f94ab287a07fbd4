import { formatInches } from "./format-inches";
import type { HouseSpec } from "./spec";
import { element, line, rect, text } from "./svg-markup";
import {
  BOARD_IN,
  dimension,
  dimText,
  FRONT_CX,
  grooveLines,
  OVERHANG_IN,
  PALETTE,
  roughening,
  SHADE_FILL,
  SIDE_CX,
  VENT_ABOVE_BOTTOM_IN,
  VENT_SLOT_IN,
  type Scale,
} from "./drawing-style";

// The two views of the house drawing, both at the scale drawing.ts picks.

export function frontView(spec: HouseSpec, k: Scale, meshFill: string): string {
  const w = spec.outerWidthIn * k.s;
  const x0 = FRONT_CX - w / 2;
  const fill = SHADE_FILL[spec.exteriorShade];
  const stroke = { stroke: PALETTE.forest, "stroke-width": 1.2 };
  const texture = roughening(spec, { mesh: meshFill });
  let out = "";
  out += rect(x0, k.frontBottom, w, k.yBottom - k.frontBottom, { fill, ...stroke });
  if (texture.spacingIn !== null)
    out += grooveLines(x0, w, k.frontBottom, k.yBottom, texture.spacingIn * k.s);
  else if (texture.fill !== "none")
    out += rect(x0, k.frontBottom, w, k.yBottom - k.frontBottom, { fill: texture.fill });
  out += rect(x0, k.yTop + k.roof, w, k.frontBottom - k.yTop - k.roof, { fill, ...stroke });
  const ventY = k.frontBottom - (VENT_ABOVE_BOTTOM_IN + VENT_SLOT_IN) * k.s;
  if (spec.vented && ventY > k.yTop + k.roof + k.s) {
    const inset = OVERHANG_IN * k.s;
    out += rect(x0 + inset, ventY, w - 2 * inset, VENT_SLOT_IN * k.s, {
      fill: PALETTE.slot,
      opacity: 0.85,
    });
    out += line(x0 + w - inset, ventY + 2, x0 + w + 16, ventY + 2, {
      stroke: PALETTE.muted,
      "stroke-width": 0.75,
    });
    out += text(x0 + w + 20, ventY + 6, "vent", { fill: PALETTE.muted, "font-size": 12 });
  }
  out += rect(x0 - OVERHANG_IN * k.s, k.yTop, w + 2 * OVERHANG_IN * k.s, k.roof, {
    fill,
    ...stroke,
  });

  const dimX = x0 - OVERHANG_IN * k.s - 18;
  out += dimension(dimX, k.yTop, dimX, k.yBottom);
  out += dimText(
    dimX - 7,
    (k.yTop + k.yBottom) / 2,
    `${formatInches(spec.outerHeightIn)} tall`,
    true,
  );
  out += dimension(x0, k.yBottom + 22, x0 + w, k.yBottom + 22);
  out += dimText(FRONT_CX, k.yBottom + 38, `${formatInches(spec.outerWidthIn)} wide`);
  if (spec.landingAreaIn > 0) {
    const x = x0 + w + 14;
    out += dimension(x, k.frontBottom, x, k.yBottom);
    out += dimText(x + 8, (k.frontBottom + k.yBottom) / 2 - 2, "landing area", false, "start");
    out += dimText(
      x + 8,
      (k.frontBottom + k.yBottom) / 2 + 12,
      formatInches(spec.landingAreaIn),
      false,
      "start",
    );
  }
  out += text(FRONT_CX, k.yBottom + 64, "Front", {
    fill: PALETTE.forest,
    "font-size": 14,
    "text-anchor": "middle",
  });
  return out;
}

export function sideView(spec: HouseSpec, k: Scale, meshFill: string): string {
  const t = BOARD_IN * k.s;
  const gap = spec.chamberGapIn * k.s;
  const depth = spec.chamberCount * gap + (spec.chamberCount + 1) * t;
  const xb = SIDE_CX - depth / 2;
  const fill = SHADE_FILL[spec.exteriorShade];
  const stroke = { stroke: PALETTE.forest, "stroke-width": 1 };
  const underRoof = k.yTop + k.roof;
  const chamberTop = Math.max(underRoof, k.frontBottom - spec.chamberHeightIn * k.s);
  const texture = roughening(spec, { mesh: meshFill });
  let out = "";

  // Chamber spaces first, tinted so the crevices read as air between boards.
  for (let i = 0; i < spec.chamberCount; i++) {
    const x = xb + t + i * (gap + t);
    out += rect(x, chamberTop, gap, k.frontBottom - chamberTop, {
      fill: PALETTE.dusk,
      opacity: 0.08,
    });
  }
  out += rect(xb, underRoof, t, k.yBottom - underRoof, { fill, ...stroke });
  if (texture.spacingIn !== null)
    out += grooveLines(xb + t, 3, k.frontBottom, k.yBottom, texture.spacingIn * k.s);
  else if (texture.fill !== "none")
    out += rect(xb + t, k.frontBottom, 3, k.yBottom - k.frontBottom, { fill: texture.fill });
  for (let i = 1; i < spec.chamberCount; i++) {
    const x = xb + i * (gap + t);
    out += rect(x, chamberTop, t, k.frontBottom - chamberTop, {
      fill: PALETTE.wood,
      stroke: PALETTE.bark,
      "stroke-width": 0.75,
    });
  }
  const xf = xb + depth - t;
  const ventTop = k.frontBottom - (VENT_ABOVE_BOTTOM_IN + VENT_SLOT_IN) * k.s;
  if (spec.vented && ventTop > underRoof + k.s) {
    out += rect(xf, underRoof, t, ventTop - underRoof, { fill, ...stroke });
    out += rect(xf, ventTop + VENT_SLOT_IN * k.s, t, k.frontBottom - ventTop - VENT_SLOT_IN * k.s, {
      fill,
      ...stroke,
    });
  } else {
    out += rect(xf, underRoof, t, k.frontBottom - underRoof, { fill, ...stroke });
  }
  if (!spec.openBottom) {
    out += rect(xb + t, k.frontBottom, depth - t, 0.4 * k.s, { fill: PALETTE.bark, ...stroke });
  }
  const roofDrop = 0.5 * k.s;
  const left = xb - 0.25 * k.s;
  const right = xb + depth + OVERHANG_IN * k.s;
  out += element("polygon", {
    points: [
      `${left},${k.yTop}`,
      `${right},${k.yTop + roofDrop}`,
      `${right},${k.yTop + roofDrop + k.roof * 0.6}`,
      `${left},${k.yTop + k.roof}`,
    ]
      .map((p) =>
        p
          .split(",")
          .map((n) => Math.round(Number(n) * 10) / 10)
          .join(","),
      )
      .join(" "),
    fill,
    ...stroke,
  });

  // Gap, chamber height and landing area, each outside the drawing with its own dimension line.
  const gapY = k.frontBottom + (spec.openBottom ? 16 : 16 + 0.4 * k.s);
  out += element(
    "g",
    { stroke: PALETTE.dusk, "stroke-width": 0.5, "stroke-dasharray": "2 2" },
    line(xb + t, k.frontBottom, xb + t, gapY) +
      line(xb + t + gap, k.frontBottom, xb + t + gap, gapY),
  );
  out += dimension(xb + t, gapY, xb + t + gap, gapY);
  out += dimText(
    xb + t + gap + 8,
    gapY + 4,
    `gap ${formatInches(spec.chamberGapIn)}`,
    false,
    "start",
  );
  const hx = right + 16;
  out += dimension(hx, chamberTop, hx, k.frontBottom);
  out += dimText(
    hx + 14,
    (chamberTop + k.frontBottom) / 2,
    `chambers ${formatInches(spec.chamberHeightIn)} tall`,
    true,
  );
  if (spec.landingAreaIn > 0) {
    const lx = xb - 16;
    out += dimension(lx, k.frontBottom, lx, k.yBottom);
    const mid = (k.frontBottom + k.yBottom) / 2;
    out += dimText(lx - 8, mid - 2, "landing", false, "end");
    out += dimText(lx - 8, mid + 12, formatInches(spec.landingAreaIn), false, "end");
  }
  const caption = `Side cutaway · ${spec.chamberCount} chamber${spec.chamberCount === 1 ? "" : "s"}`;
  out += text(SIDE_CX, k.yBottom + 64, caption, {
    fill: PALETTE.forest,
    "font-size": 14,
    "text-anchor": "middle",
  });
  return out;
}
