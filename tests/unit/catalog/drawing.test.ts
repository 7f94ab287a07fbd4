import { XMLValidator } from "fast-xml-parser";
import { describe, expect, it } from "vitest";
import { houseDrawingSvg } from "@/lib/catalog/drawing";
import { formatInches } from "@/lib/catalog/spec";
import { SOUND_SPEC, withSpec } from "./sample-spec";

// fast-xml-parser (a registry XML library) checks that every drawing is
// well-formed XML: one unescaped "<" or "&" in a staff-typed name would break the whole page.
const wellFormed = (svg: string) => XMLValidator.validate(svg);

describe("houseDrawingSvg", () => {
  const svg = houseDrawingSvg({ name: "Hollow Oak Four", spec: SOUND_SPEC });

  it("is a well-formed, accessible SVG image", () => {
    expect(wellFormed(svg)).toBe(true);
    expect(svg).toMatch(/^<svg xmlns="http:\/\/www\.w3\.org\/2000\/svg" viewBox="0 0 900 600"/);
    expect(svg).toMatch(/role="img"/);
    const labelledBy = /aria-labelledby="([^"]+)"/.exec(svg)?.[1]?.split(" ") ?? [];
    expect(labelledBy).toHaveLength(2);
    for (const id of labelledBy) expect(svg).toContain(`id="${id}"`);
    expect(svg).toMatch(/<title id="[^"]+">Drawing of Hollow Oak Four<\/title>/);
    expect(svg).toMatch(/<desc id="[^"]+">Hollow Oak Four: front view and side cutaway\./);
  });

  it("labels the gap, chamber height, landing area and outside size in inches and cm", () => {
    for (const label of [
      `gap ${formatInches(0.75)}`,
      `chambers ${formatInches(24)} tall`,
      formatInches(5),
      `${formatInches(31)} tall`,
      `${formatInches(24)} wide`,
    ]) {
      expect(svg).toContain(label);
    }
    expect(svg).toContain("Side cutaway · 4 chambers");
  });

  it("escapes whatever staff type as the name", () => {
    const hostile = houseDrawingSvg({
      name: `<script>alert("x")</script> & 'Co'\u0001`,
      spec: SOUND_SPEC,
    });
    expect(wellFormed(hostile)).toBe(true);
    expect(hostile).not.toContain("<script");
    expect(hostile).toContain(
      "&lt;script&gt;alert(&quot;x&quot;)&lt;/script&gt; &amp; &apos;Co&apos;",
    );
    expect(hostile).not.toContain("\u0001");
  });

  it("shortens a very long name in the heading but keeps it whole in the description", () => {
    const name = `Wide Meadow ${"Twelve ".repeat(20)}`.trim();
    const long = houseDrawingSvg({ name, spec: SOUND_SPEC });
    expect(long).toMatch(/Wide Meadow Twelve[^<]*…<\/text>/);
    expect(long).toContain(`<desc`);
    expect(long).toContain(`${name}: front view`);
  });

  it("fills the house with its outside shade", () => {
    const fills = (["black", "dark", "medium", "light", "white"] as const).map((shade) => {
      const drawn = houseDrawingSvg({ name: "x", spec: withSpec({ exteriorShade: shade }) });
      return /<rect x="[^"]+" y="115" [^>]*fill="(#[0-9a-f]{6})"/.exec(drawn)?.[1];
    });
    expect(new Set(fills).size).toBe(5);
  });

  it("draws vents, the closed floor and one chamber only when the spec says so", () => {
    const plain = houseDrawingSvg({
      name: "x",
      spec: withSpec({ vented: false, openBottom: false, chamberCount: 1 }),
    });
    expect(wellFormed(plain)).toBe(true);
    expect(svg).toContain(">vent<");
    expect(plain).not.toContain(">vent<");
    expect(plain).toContain("No vents. Closed floor.");
    expect(plain).toContain("Side cutaway · 1 chamber<");
  });

  it("gives two different models different ids, so both can sit on one page", () => {
    const other = houseDrawingSvg({ name: "Little Ridge Single", spec: SOUND_SPEC });
    const titleId = (s: string) => /<title id="([^"]+)"/.exec(s)?.[1];
    expect(titleId(other)).not.toBe(titleId(svg));
  });

  it("stays well-formed at the edges of the spec ranges", () => {
    for (const spec of [
      withSpec({ chamberCount: 12, chamberGapIn: 4, outerWidthIn: 60, chamberWidthIn: 48 }),
      withSpec({
        outerHeightIn: 4,
        chamberHeightIn: 2,
        landingAreaIn: 24,
        outerWidthIn: 4,
        chamberWidthIn: 2,
      }),
      withSpec({ landingAreaIn: 0, interiorSurface: "plastic-mesh" }),
    ]) {
      const drawn = houseDrawingSvg({ name: "Edge", spec });
      expect(wellFormed(drawn)).toBe(true);
      expect(drawn).not.toMatch(/NaN|Infinity|-\d+(\.\d+)?" height|width="-/);
    }
  });
});
