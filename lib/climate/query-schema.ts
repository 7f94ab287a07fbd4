import { z } from "zod";
import { queryDecimal } from "@/lib/http/query-number";
import type { ClimateInput } from "./resolve";

// GET /api/climate: a ZIP code, a latitude/longitude, or a typed value in °F or °C (the average
// daily high of the warmest month; `julyHighF`/`julyHighC` are kept as older names of the same).
// Plausible ranges: the U.S. normals run from about 40 °F (arctic Alaska) to 116.5 °F (Death
// Valley); the limits leave room either side. Common practice, no source.

// Numbers are read as plain decimal digits only ("0x10" or "1e2" is refused, not read as 16 or 100).
const number = (what: string, min: number, max: number, tooLow?: string, tooHigh?: string) =>
  queryDecimal(z.number({ error: `Type the ${what} as a number.` }).min(min, tooLow).max(max, tooHigh).optional());
const highF = () =>
  number("temperature", -20, 135, "A summer high below -20 °F is not plausible; check the number.", "A summer high above 135 °F is not plausible; check the number.");
const highC = () =>
  number("temperature", -29, 57, "A summer high below -29 °C is not plausible; check the number.", "A summer high above 57 °C is not plausible; check the number.");

export const climateQuerySchema = z
  .object({
    zip: z.string().trim().optional(),
    lat: number("latitude", -90, 90),
    lon: number("longitude", -180, 180),
    highF: highF(),
    highC: highC(),
    julyHighF: highF(),
    julyHighC: highC(),
  })
  .transform((q) => ({
    zip: q.zip === "" ? undefined : q.zip,
    lat: q.lat,
    lon: q.lon,
    highF: q.highF ?? q.julyHighF,
    highC: q.highC ?? q.julyHighC,
  }))
  .refine((q) => !(q.highF !== undefined && q.highC !== undefined), {
    message: "Give the temperature in °F or in °C, not both.",
    path: ["value"],
  })
  .refine((q) => !(q.zip !== undefined && (q.lat !== undefined || q.highF !== undefined || q.highC !== undefined)), {
    message: "Give a ZIP code or your warmest month's average high, one of them.",
    path: ["zip"],
  })
  .refine((q) => (q.lat === undefined) === (q.lon === undefined), {
    message: "Give both a latitude and a longitude.",
    path: ["lat"],
  })
  .refine((q) => [q.zip, q.lat, q.highF ?? q.highC].some((v) => v !== undefined), {
    message: "Give a ZIP code, a latitude and longitude, or your warmest month's average high (in °F or °C).",
    path: ["zip"],
  });

export function toClimateInput(q: z.infer<typeof climateQuerySchema>): ClimateInput {
  const typed = q.highF !== undefined ? { value: q.highF, unit: "F" as const } : q.highC !== undefined ? { value: q.highC, unit: "C" as const } : undefined;
  return {
    ...(q.zip !== undefined ? { zip: q.zip } : {}),
    ...(q.lat !== undefined && q.lon !== undefined ? { lat: q.lat, lon: q.lon } : {}),
    ...(typed ? { typed } : {}),
  };
}
