// The D1–D11 design criteria: thresholds, the rule as staff read it, and where each comes from.
// The evaluation lives in design-check.ts; keeping numbers and sources here lets tests and
// pages quote the same text.

export type CriterionId =
  "D1" | "D2" | "D3" | "D4" | "D5" | "D6" | "D7" | "D8" | "D9" | "D10" | "D11";
export type CriterionKind = "required" | "advisory";

export type CriterionDefinition = {
  id: CriterionId;
  kind: CriterionKind;
  title: string;
  rule: string;
  source: string;
};

// Full citations stay in code comments. The `source` strings below are shown to staff and
// buyers, so they describe each source in plain words without naming people or organizations:
// what it is and its year. Every page that names one of these sources uses SOURCE_NAMES, so the
// store cites in one style everywhere.
//   HANDBOOK: Tuttle, M. D., Kiser, M. & Kiser, S., The Bat House Builder's Handbook (2004),
//     as quoted in agency guides; its nursery-house plan reprinted in Downhome Life.
//   GUIDELINES_1998: 1998 roost-house certification guidelines, reproduced in the Kitsap Sun,
//     1999-08-21.
//   STATE_GROUP: Bat Conservation of Wisconsin, "Attracting Bats".
//   REGIONAL_GUIDE: Shuswap Watershed Project, bat-house guide (plastic mesh, not metal).
export const SOURCE_NAMES = {
  handbook: "A published bat-house building handbook (2004)",
  guidelines1998: "Published roost-house guidelines (1998)",
  stateGroup: "A state bat-conservation group's guide",
  regionalGuide: "A regional watershed group's bat-house guide",
} as const;
const HANDBOOK = SOURCE_NAMES.handbook;
const GUIDELINES_1998 = SOURCE_NAMES.guidelines1998;
const STATE_GROUP = SOURCE_NAMES.stateGroup;
const REGIONAL_GUIDE = SOURCE_NAMES.regionalGuide;

export const DESIGN_LIMITS = {
  // D1: both ends included.
  gapMinIn: 0.75,
  gapMaxIn: 1,
  // D2
  chamberHeightMinIn: 20,
  chamberHeightGenerousIn: 24,
  // D3
  chamberWidthMinIn: 14,
  // D4
  chambersPreferred: 4,
  // D5: 3–6 in is typical; longer still passes.
  landingMinIn: 3,
  landingTypicalMaxIn: 6,
  // D6
  grooveSpacingMinIn: 1 / 4,
  grooveSpacingMaxIn: 1 / 2,
  grooveDepthMinIn: 1 / 32,
  grooveDepthMaxIn: 1 / 16,
  // D10
  outerHeightMinIn: 24,
  outerWidthMinIn: 14,
  outerWidthPreferredIn: 17,
} as const;

export const DESIGN_CRITERIA: Record<CriterionId, CriterionDefinition> = {
  D1: {
    id: "D1",
    kind: "required",
    title: "Chamber gap",
    rule: "3/4 in to 1 in front to back, both ends included",
    source: `${HANDBOOK}, as quoted in agency guides; ${GUIDELINES_1998}; common practice: wider gaps invite wasps and birds`,
  },
  D2: {
    id: "D2",
    kind: "required",
    title: "Chamber height",
    rule: "At least 20 in inside (24 in or more is generous)",
    source: GUIDELINES_1998,
  },
  D3: {
    id: "D3",
    kind: "required",
    title: "Chamber width",
    rule: "At least 14 in inside",
    source: GUIDELINES_1998,
  },
  D4: {
    id: "D4",
    kind: "advisory",
    title: "Number of chambers",
    rule: "4 or more preferred",
    source:
      "Common practice: more chambers let bats move to a warmer or cooler spot; wildlife agency guides (multi-chamber nursery houses are more successful)",
  },
  D5: {
    id: "D5",
    kind: "required",
    title: "Landing area",
    rule: "At least 3 in below the entrance (3 to 6 in is typical)",
    source: `${HANDBOOK}, as quoted in agency guides`,
  },
  D6: {
    id: "D6",
    kind: "required",
    title: "Grip inside",
    rule: "Grooves 1/4 to 1/2 in apart and 1/32 to 1/16 in deep, or plastic mesh",
    source: `${HANDBOOK}, nursery-house plan; ${REGIONAL_GUIDE} (plastic mesh, not metal)`,
  },
  D7: {
    id: "D7",
    kind: "advisory",
    title: "Inside finish",
    rule: "Bare or stained; paint fills the grooves",
    source: `${HANDBOOK}, nursery-house plan`,
  },
  D8: {
    id: "D8",
    kind: "required",
    title: "Sealed seams",
    rule: "Seams caulked, above all at the roof",
    source: `${STATE_GROUP}; ${REGIONAL_GUIDE}`,
  },
  D9: {
    id: "D9",
    kind: "required",
    title: "Wood",
    rule: "Exterior plywood or cedar; not pressure-treated",
    source: `${STATE_GROUP}; ${REGIONAL_GUIDE}`,
  },
  D10: {
    id: "D10",
    kind: "advisory",
    title: "House size",
    rule: "At least 24 in tall and 14 in wide; about 17 in wide or more preferred",
    source: `${GUIDELINES_1998}; common practice (about 17 in wide by 20 in tall or larger)`,
  },
  D11: {
    id: "D11",
    kind: "advisory",
    title: "Open bottom",
    rule: "No floor, so droppings fall out",
    source: "Common practice, no source",
  },
};
