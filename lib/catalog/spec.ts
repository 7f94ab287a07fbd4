import { z } from "zod";

export { formatInches } from "./format-inches";
export * from "./spec-words";
import { INTERIOR_FINISHES, INTERIOR_SURFACES, SHADES, WOODS } from "./spec-words";

// The listed specification of a house model. Lengths are decimal inches (shop fractions are
// shown with formatInches). The ranges only catch typing mistakes (feet or centimetres typed
// as inches); whether a value is good enough is the design check's job, so a 1 1/2 in gap is
// accepted here and failed there with a reason.

type LengthField = { label: string; min: number; max: number; hint: string };

function lengthInches({ label, min, max, hint }: LengthField) {
  return z
    .number({
      error: (issue) =>
        issue.input === undefined || issue.input === null
          ? `Enter the ${label} in inches.`
          : `The ${label} must be a number of inches, like 0.75 for 3/4 in.`,
    })
    .min(min, `The ${label} must be at least ${min} in. ${hint}`)
    .max(
      max,
      `The ${label} must be at most ${max} in. Was it typed in feet or centimetres? ${hint}`,
    );
}

function choice<T extends readonly [string, ...string[]]>(values: T, what: string) {
  return z.enum(values, { error: `Choose the ${what}.` });
}

function yesNo(question: string) {
  return z.boolean({ error: `Answer yes or no: ${question}` });
}

export const houseSpecSchema = z
  .object({
    chamberCount: z
      .number({ error: "Enter the number of chambers." })
      .int("The number of chambers is a whole number.")
      .min(1, "A house has at least 1 chamber.")
      .max(12, "We list houses with at most 12 chambers."),
    chamberGapIn: lengthInches({
      label: "chamber gap",
      min: 0.25,
      max: 4,
      hint: "It is the front-to-back width of one crevice, usually 3/4 to 1 in.",
    }),
    chamberHeightIn: lengthInches({
      label: "chamber height",
      min: 2,
      max: 60,
      hint: "Measure inside, top to bottom.",
    }),
    chamberWidthIn: lengthInches({
      label: "chamber width",
      min: 2,
      max: 48,
      hint: "Measure inside, side to side.",
    }),
    landingAreaIn: lengthInches({
      label: "landing area",
      min: 0,
      max: 24,
      hint: "It is how far the back board reaches below the entrance; 0 if there is none.",
    }),
    interiorSurface: choice(INTERIOR_SURFACES, "inside surface"),
    grooveSpacingIn: lengthInches({
      label: "groove spacing",
      min: 0.05,
      max: 2,
      hint: "It is the distance between grooves, usually 1/4 to 1/2 in.",
    }).optional(),
    grooveDepthIn: lengthInches({
      label: "groove depth",
      min: 0.005,
      max: 0.5,
      hint: "Grooves are shallow, usually 1/32 to 1/16 in (0.03 to 0.06).",
    }).optional(),
    interiorFinish: choice(INTERIOR_FINISHES, "inside finish"),
    seamsSealed: yesNo("are the seams sealed?"),
    wood: choice(WOODS, "wood"),
    outerHeightIn: lengthInches({
      label: "outside height",
      min: 4,
      max: 72,
      hint: "Measure the whole house, top to bottom.",
    }),
    outerWidthIn: lengthInches({
      label: "outside width",
      min: 4,
      max: 60,
      hint: "Measure the whole house, side to side.",
    }),
    openBottom: yesNo("is the bottom open?"),
    exteriorShade: choice(SHADES, "outside shade"),
    vented: yesNo("does it have vents?"),
  })
  .superRefine((spec, ctx) => {
    // The chambers sit inside the house, so an inside size larger than the outside is a typo.
    if (spec.chamberHeightIn > spec.outerHeightIn) {
      ctx.addIssue({
        code: "custom",
        path: ["chamberHeightIn"],
        message: "The chamber height cannot be more than the outside height.",
      });
    }
    if (spec.chamberWidthIn > spec.outerWidthIn) {
      ctx.addIssue({
        code: "custom",
        path: ["chamberWidthIn"],
        message: "The chamber width cannot be more than the outside width.",
      });
    }
  });

export type HouseSpec = z.infer<typeof houseSpecSchema>;

export const SPEC_FIELD_LABELS: Record<keyof HouseSpec, string> = {
  chamberCount: "Chambers",
  chamberGapIn: "Chamber gap",
  chamberHeightIn: "Chamber height",
  chamberWidthIn: "Chamber width",
  landingAreaIn: "Landing area",
  interiorSurface: "Inside surface",
  grooveSpacingIn: "Groove spacing",
  grooveDepthIn: "Groove depth",
  interiorFinish: "Inside finish",
  seamsSealed: "Seams sealed",
  wood: "Wood",
  outerHeightIn: "Outside height",
  outerWidthIn: "Outside width",
  openBottom: "Open bottom",
  exteriorShade: "Outside shade",
  vented: "Vents",
};
