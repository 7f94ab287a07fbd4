// Inputs of the placement endpoints, with the messages a buyer reads next to each field.
//   POST /api/placement  body: placementInputSchema (JSON: numbers must arrive as numbers)
//   GET  /api/sun-hours  query: sunHoursQuerySchema (strings from the URL, coerced here;
//                        skyline as a comma list of 16 angles, north first)
import { z } from "zod";
import { findSkylineProblem, parseSkylineQuery } from "./skyline";
import { isCalendarDate } from "./sun-calendar";

function jsonNumber(label: string) {
  return z.number({
    error: (issue) =>
      issue.input === undefined ? `${label} is required.` : `${label} must be a number.`,
  });
}

function jsonBoolean(question: string) {
  return z.boolean({ error: `Answer yes or no: ${question}` });
}

// A form may send null (JSON.stringify turns NaN into null) for a field left empty: treat it
// as "not given" rather than as a wrong type.
function optionalJson<T extends z.ZodType>(schema: T) {
  return schema.nullish().transform((value) => value ?? undefined);
}

const latitude = jsonNumber("Latitude")
  .min(-90, "Latitude must be between -90 and 90.")
  .max(90, "Latitude must be between -90 and 90.");
const longitude = jsonNumber("Longitude")
  .min(-180, "Longitude must be between -180 and 180.")
  .max(180, "Longitude must be between -180 and 180.");
const facing = jsonNumber("Facing")
  .min(0, "Facing must be a compass bearing from 0° up to (not including) 360°.")
  .lt(360, "Facing must be a compass bearing from 0° up to (not including) 360°.");

/**
 * The site's skyline (PRODUCT.md §4): exactly 16 finite angles from 0 to 90°, north first and
 * clockwise. Any fault is one message on the `skyline` field, naming the direction.
 */
export const skylineSchema = z.custom<number[]>((value) => findSkylineProblem(value) === null, {
  error: (issue) => findSkylineProblem(issue.input) ?? "Check the skyline angles.",
});

const mountSchema = z.enum(["pole", "building", "tree"], {
  error: "Choose where the house goes: a pole, a building wall or a tree.",
});

export const placementInputSchema = z
  .object({
    zip: optionalJson(
      z
        .string({ error: "Enter the ZIP code as text." })
        .trim()
        .regex(/^\d{5}$/, "Enter a 5-digit U.S. ZIP code."),
    ),
    lat: optionalJson(latitude),
    lon: optionalJson(longitude),
    // The buyer's own average daily high of the warmest month (July north of the equator,
    // January south of it), in °F or in °C (one of them); when absent it comes from the nearest
    // stations (lib/climate). The field keeps its older name "julyHighF" for saved sites.
    julyHighF: optionalJson(
      jsonNumber("Summer high")
        .min(30, "Enter the average high of your warmest month in °F (between 30 and 130).")
        .max(130, "Enter the average high of your warmest month in °F (between 30 and 130)."),
    ),
    julyHighC: optionalJson(
      jsonNumber("Summer high")
        .min(-1, "Enter the average high of your warmest month in °C (between -1 and 54).")
        .max(54, "Enter the average high of your warmest month in °C (between -1 and 54)."),
    ),
    mount: mountSchema,
    heightFt: jsonNumber("Height")
      .min(0, "Height can't be below the ground.")
      .max(100, "Height above 100 ft looks like a typo: enter feet above the ground."),
    facingDeg: facing,
    pairedBackToBack: jsonBoolean("is this a back-to-back pair?"),
    stacked: jsonBoolean("is one house mounted above another?"),
    waterMi: jsonNumber("Distance to water").min(0, "Distance to water can't be negative."),
    woodsEdgeFt: jsonNumber("Distance to trees").min(0, "Distance to trees can't be negative."),
    clearFlightPath: jsonBoolean("is the flight path below the house clear?"),
    brightLight: jsonBoolean("is there a bright light on or near the house?"),
    predators: jsonBoolean("are there outdoor cats or other predators nearby?"),
    // Optional: without it an open sky is assumed, and the answer says so.
    skyline: optionalJson(skylineSchema),
  })
  .superRefine((input, ctx) => {
    const hasLat = input.lat !== undefined;
    const hasLon = input.lon !== undefined;
    if (hasLat !== hasLon) {
      ctx.addIssue({
        code: "custom",
        path: [hasLat ? "lon" : "lat"],
        message: "Give both latitude and longitude, or neither.",
      });
    }
    if (input.julyHighF !== undefined && input.julyHighC !== undefined) {
      ctx.addIssue({ code: "custom", path: ["julyHighC"], message: "Give the summer high in °F or in °C, not both." });
    }
    if (input.zip === undefined && !hasLat && !hasLon) {
      ctx.addIssue({
        code: "custom",
        path: ["zip"],
        message: "Enter a ZIP code, or a latitude and longitude.",
      });
    }
  });

export type PlacementInput = z.infer<typeof placementInputSchema>;

// Query strings: accept plain decimals only ("40.7", "-74"), so "0x10", "1e3" or "" are refused
// instead of silently becoming numbers; a missing parameter (null from URLSearchParams.get or
// undefined from Object.fromEntries) reads as "required".
const DECIMAL = /^\s*[-+]?(\d+\.?\d*|\.\d+)\s*$/;

function queryNumber<T extends z.ZodNumber>(inner: T) {
  return z.preprocess((value) => {
    if (value === null || value === "") return undefined;
    return typeof value === "string" && DECIMAL.test(value) ? Number(value) : value;
  }, inner);
}

export const sunHoursQuerySchema = z.object({
  lat: queryNumber(latitude),
  lon: queryNumber(longitude),
  facingDeg: queryNumber(facing),
  // Optional: with a mount the answer adds the sun on the house by mount (PRODUCT.md §4).
  mount: z.preprocess(
    (value) => (value === null || value === "" ? undefined : value),
    mountSchema.optional(),
  ),
  // Optional: 16 angles as a comma list, north first and clockwise ("0,0,5,20,…").
  skyline: z.preprocess(parseSkylineQuery, skylineSchema.optional()),
  // Optional: without a date the endpoint can answer with the whole season.
  date: z.preprocess(
    (value) => (value === null || value === "" ? undefined : value),
    z
      .string({ error: "Enter the date as YYYY-MM-DD." })
      // abort: a malformed date gets one message, not a second "does not exist" as well.
      .regex(/^\d{4}-\d{2}-\d{2}$/, {
        error: "Enter the date as YYYY-MM-DD, for example 2026-06-21.",
        abort: true,
      })
      .refine(isCalendarDate, "That date does not exist: check the month and the day.")
      .refine(
        (date) => Number(date.slice(0, 4)) >= 1900 && Number(date.slice(0, 4)) <= 2100,
        "Choose a date between the years 1900 and 2100.",
      )
      .optional(),
  ),
});

export type SunHoursQuery = z.infer<typeof sunHoursQuerySchema>;
