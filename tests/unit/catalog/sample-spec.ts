import type { HouseSpec } from "@/lib/catalog/spec";

// A four-chamber nursery house that meets every criterion, the starting point that each test
// changes one field of.
export const SOUND_SPEC: HouseSpec = {
  chamberCount: 4,
  chamberGapIn: 0.75,
  chamberHeightIn: 24,
  chamberWidthIn: 20,
  landingAreaIn: 5,
  interiorSurface: "grooved",
  grooveSpacingIn: 0.375,
  grooveDepthIn: 1 / 32,
  interiorFinish: "stained",
  seamsSealed: true,
  wood: "exterior-plywood",
  outerHeightIn: 31,
  outerWidthIn: 24,
  openBottom: true,
  exteriorShade: "dark",
  vented: true,
};

export const withSpec = (changes: Partial<HouseSpec>): HouseSpec => ({ ...SOUND_SPEC, ...changes });

