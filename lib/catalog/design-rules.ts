import { DESIGN_LIMITS as L } from "./design-criteria";
import { formatInches } from "./format-inches";
import {
  INTERIOR_FINISH_LABELS,
  INTERIOR_SURFACE_LABELS,
  WOOD_LABELS,
  type HouseSpec,
} from "./spec";

// The evaluation of each design criterion D1–D11 on one value; thresholds and sources are in
// design-criteria.ts, and checkDesign in design-check.ts puts the results together.

export type CriterionStatus = "pass" | "note" | "fail";

/** One criterion's verdict; `field` overrides where the staff form shows it. */
export type Outcome = {
  status: CriterionStatus;
  value: string;
  reason: string;
  field?: keyof HouseSpec;
};

// Lengths arrive as decimals (1.13 - 0.38 is 0.7499999999999999); a billionth of an inch of
// slack keeps a typed 3/4 or 1 on the passing side of an inclusive boundary.
const EPSILON_IN = 1e-9;
const atLeast = (value: number, min: number) => value >= min - EPSILON_IN;
const atMost = (value: number, max: number) => value <= max + EPSILON_IN;

const yesNo = (flag: boolean) => (flag ? "Yes" : "No");
const plural = (n: number, word: string) => `${n} ${word}${n === 1 ? "" : "s"}`;

export function checkGap(gap: number): Outcome {
  const value = formatInches(gap);
  if (!atLeast(gap, L.gapMinIn)) {
    return { status: "fail", value, reason: "Crevices under 3/4 in are too tight for most bats." };
  }
  if (!atMost(gap, L.gapMaxIn)) {
    return {
      status: "fail",
      value,
      reason: "Crevices over 1 in feel less snug to bats and let wasps and birds move in.",
    };
  }
  return { status: "pass", value, reason: "Each crevice is snug front to back, as bats like it." };
}

export function checkChamberHeight(height: number): Outcome {
  const value = formatInches(height);
  if (!atLeast(height, L.chamberHeightMinIn)) {
    return {
      status: "fail",
      value,
      reason: "Chambers under 20 in tall leave bats too little room to move as the day warms.",
    };
  }
  const reason = atLeast(height, L.chamberHeightGenerousIn)
    ? "Generously tall chambers give bats plenty of room to find a comfortable spot."
    : "Chambers are tall enough for bats to move up or down as the day warms.";
  return { status: "pass", value, reason };
}

export function checkChamberWidth(width: number): Outcome {
  const value = formatInches(width);
  return atLeast(width, L.chamberWidthMinIn)
    ? { status: "pass", value, reason: "Chambers are wide enough for a colony to spread out." }
    : {
        status: "fail",
        value,
        reason: "Chambers under 14 in wide hold too few bats for a colony.",
      };
}

export function checkChamberCount(count: number): Outcome {
  const value = plural(count, "chamber");
  if (count >= L.chambersPreferred) {
    return {
      status: "pass",
      value,
      reason: "Several chambers let bats pick a warmer or cooler spot.",
    };
  }
  if (count >= 2) {
    return {
      status: "note",
      value,
      reason:
        "With 2 or 3 chambers bats have fewer spots to choose from; 4 or more suit nursery colonies best.",
    };
  }
  return {
    status: "note",
    value,
    reason:
      "A single chamber gives bats no warmer or cooler spot to move to; houses with 4 or more are taken up more often.",
  };
}

export function checkLanding(landing: number): Outcome {
  const value = formatInches(landing);
  if (!atLeast(landing, L.landingMinIn)) {
    return {
      status: "fail",
      value,
      reason:
        landing === 0
          ? "There is no landing area; bats need at least 3 in below the entrance to land and climb in."
          : "The landing area is short; bats need at least 3 in below the entrance to land and climb in.",
    };
  }
  return {
    status: "pass",
    value,
    reason: "Bats have room below the entrance to land and climb in.",
  };
}

export function checkGrip(spec: HouseSpec): Outcome {
  const surface = INTERIOR_SURFACE_LABELS[spec.interiorSurface];
  switch (spec.interiorSurface) {
    case "plastic-mesh":
      return { status: "pass", value: surface, reason: "Plastic mesh gives bats a firm grip." };
    case "metal-mesh":
      return {
        status: "fail",
        value: surface,
        reason: "Metal mesh can rust and catch wings and feet; grooves or plastic mesh are safe.",
      };
    case "smooth":
      return {
        status: "fail",
        value: surface,
        reason: "Bats cannot hang on smooth wood; the inside needs grooves or plastic mesh.",
      };
    case "grooved":
      return checkGrooves(spec.grooveSpacingIn, spec.grooveDepthIn);
  }
}

export function checkGrooves(spacing: number | undefined, depth: number | undefined): Outcome {
  if (spacing === undefined || depth === undefined) {
    return {
      status: "fail",
      field: spacing === undefined ? "grooveSpacingIn" : "grooveDepthIn",
      value: "Grooved wood, groove size not given",
      reason: "Groove spacing and depth are needed to tell whether bats can grip.",
    };
  }
  const value = `Grooved wood, ${formatInches(spacing)} apart, ${formatInches(depth)} deep`;
  if (!atLeast(spacing, L.grooveSpacingMinIn) || !atMost(spacing, L.grooveSpacingMaxIn)) {
    return {
      status: "fail",
      field: "grooveSpacingIn",
      value,
      reason: "Grooves should be 1/4 to 1/2 in apart for bats' claws to find a hold.",
    };
  }
  if (!atLeast(depth, L.grooveDepthMinIn) || !atMost(depth, L.grooveDepthMaxIn)) {
    return {
      status: "fail",
      field: "grooveDepthIn",
      value,
      reason:
        "Grooves should be 1/32 to 1/16 in deep: deep enough to grip, shallow enough to stay clean.",
    };
  }
  return { status: "pass", value, reason: "Grooved inside walls give bats a firm grip." };
}

export function checkFinish(finish: HouseSpec["interiorFinish"]): Outcome {
  const value = INTERIOR_FINISH_LABELS[finish];
  return finish === "painted"
    ? {
        status: "note",
        value,
        reason: "Paint inside tends to fill the grooves and make them slick.",
      }
    : { status: "pass", value, reason: "The inside is left unpainted, so the grooves stay open." };
}

export function checkSeams(sealed: boolean): Outcome {
  return sealed
    ? {
        status: "pass",
        value: "Yes",
        reason: "Sealed seams keep the chambers dry and free of drafts.",
      }
    : {
        status: "fail",
        value: "No",
        reason: "Unsealed seams, above all at the roof, let rain and drafts in.",
      };
}

export function checkWood(wood: HouseSpec["wood"]): Outcome {
  const value = WOOD_LABELS[wood];
  if (wood === "exterior-plywood" || wood === "cedar") {
    return { status: "pass", value, reason: "The wood stands up to weather and is safe for bats." };
  }
  return wood === "pressure-treated"
    ? {
        status: "fail",
        value,
        reason: "Pressure-treated wood carries chemicals we keep out of roosts.",
      }
    : {
        status: "fail",
        value,
        reason: "We accept exterior plywood or cedar; other woods are not yet proven here.",
      };
}

export function checkHouseSize(height: number, width: number): Outcome {
  const value = `${formatInches(height)} tall × ${formatInches(width)} wide`;
  if (!atLeast(height, L.outerHeightMinIn) || !atLeast(width, L.outerWidthMinIn)) {
    return {
      status: "note",
      field: atLeast(height, L.outerHeightMinIn) ? "outerWidthIn" : "outerHeightIn",
      value,
      reason: "A house under 24 in tall by 14 in wide holds fewer bats and heats and cools faster.",
    };
  }
  if (!atLeast(width, L.outerWidthPreferredIn)) {
    return {
      status: "note",
      field: "outerWidthIn",
      value,
      reason: "Big enough; houses about 17 in wide or more tend to do a little better.",
    };
  }
  return {
    status: "pass",
    value,
    reason: "A roomy house holds a colony and keeps its warmth steady.",
  };
}

export function checkOpenBottom(open: boolean): Outcome {
  return open
    ? {
        status: "pass",
        value: yesNo(open),
        reason: "Droppings fall out the open bottom, so it stays clean.",
      }
    : {
        status: "note",
        value: yesNo(open),
        reason: "A closed floor collects droppings and needs clearing out.",
      };
}
