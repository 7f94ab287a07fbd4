import { formatInches } from "./format-inches";
import { INTERIOR_SURFACE_LABELS, type HouseSpec } from "./spec";
import { element, escapeXml, idPrefix, rect, shorten, text } from "./svg-markup";
import { BOARD_IN, FONT, HEIGHT, PALETTE, ROOF_IN, TOP, WIDTH, type Scale } from "./drawing-style";
import { frontView, sideView } from "./drawing-views";

// A calm two-view sketch of a house model: the front as a buyer sees it on the wall, and a side
// cutaway showing chambers, gaps, landing area and vents. Both views share one scale. It is an
// illustration, not a building plan: board thickness is drawn at 1/2 in, which the spec does
// not record.

function scaleFor(spec: HouseSpec): Scale {
  const depthIn = spec.chamberCount * spec.chamberGapIn + (spec.chamberCount + 1) * BOARD_IN;
  const s = Math.min(360 / spec.outerHeightIn, 280 / spec.outerWidthIn, 170 / depthIn);
  const yBottom = TOP + spec.outerHeightIn * s;
  const roof = Math.min(ROOF_IN, spec.outerHeightIn * 0.1) * s;
  // The back board runs past the front by the landing area; keep at least a sliver of front.
  const landing = Math.min(spec.landingAreaIn * s, yBottom - TOP - roof - s);
  return { s, yTop: TOP, yBottom, frontBottom: yBottom - Math.max(0, landing), roof };
}

function describe(name: string, spec: HouseSpec): string {
  return [
    `${name}: front view and side cutaway.`,
    `Outside ${formatInches(spec.outerHeightIn)} tall by ${formatInches(spec.outerWidthIn)} wide, ${spec.exteriorShade}.`,
    `${spec.chamberCount} chamber${spec.chamberCount === 1 ? "" : "s"}, each with a ${formatInches(spec.chamberGapIn)} gap and ${formatInches(spec.chamberHeightIn)} tall.`,
    spec.landingAreaIn > 0
      ? `Landing area ${formatInches(spec.landingAreaIn)}.`
      : "No landing area.",
    `Inside: ${INTERIOR_SURFACE_LABELS[spec.interiorSurface].toLowerCase()}.`,
    spec.vented ? "Vented 6 in above the bottom." : "No vents.",
    spec.openBottom ? "Open bottom." : "Closed floor.",
  ].join(" ");
}

/** An accessible SVG drawing (role="img" with title and description); all text is escaped. */
export function houseDrawingSvg({ name, spec }: { name: string; spec: HouseSpec }): string {
  const p = idPrefix(`${name}|${JSON.stringify(spec)}`);
  const ids = { title: `${p}-title`, desc: `${p}-desc`, mesh: `${p}-mesh` };
  const k = scaleFor(spec);
  const meshStroke = spec.interiorSurface === "metal-mesh" ? "#7d8084" : PALETTE.forest;
  const defs = element(
    "pattern",
    { id: ids.mesh, width: 4, height: 4, patternUnits: "userSpaceOnUse" },
    element("path", {
      d: "M0 0L4 4M4 0L0 4",
      stroke: meshStroke,
      "stroke-width": 0.5,
      opacity: 0.5,
    }),
  );
  const heading = shorten(name.trim() === "" ? "Untitled model" : name.trim(), 60);
  const body = [
    `<title id="${ids.title}">${escapeXml(`Drawing of ${heading}`)}</title>`,
    `<desc id="${ids.desc}">${escapeXml(describe(name.trim(), spec))}</desc>`,
    `<defs>${defs}</defs>`,
    rect(0, 0, WIDTH, HEIGHT, { fill: PALETTE.paper }),
    text(40, 46, heading, {
      fill: PALETTE.forest,
      "font-size": 22,
      "font-family": "Fraunces, Georgia, serif",
    }),
    text(40, 68, "Front and side cutaway, drawn to one scale · sizes in inches (cm)", {
      fill: PALETTE.muted,
      "font-size": 13,
    }),
    frontView(spec, k, ids.mesh),
    sideView(spec, k, ids.mesh),
    text(40, HEIGHT - 22, "A sketch for illustration, not a building plan.", {
      fill: PALETTE.muted,
      "font-size": 11,
    }),
  ].join("");
  return element(
    "svg",
    {
      xmlns: "http://www.w3.org/2000/svg",
      viewBox: `0 0 ${WIDTH} ${HEIGHT}`,
      width: WIDTH,
      height: HEIGHT,
      role: "img",
      "aria-labelledby": `${ids.title} ${ids.desc}`,
      "font-family": FONT,
    },
    body,
  );
}
