import "server-only";
import { z } from "zod";
import { queryDecimal } from "@/lib/http/query-number";
import { getDb } from "@/db/client";
import { climateStations } from "@/db/schema";
import { AppError } from "@/lib/http/errors";
import {
  bandForJulyHigh,
  celsiusToFahrenheit,
  fahrenheitToCelsius,
  nearBandEdge,
  type BandEdge,
  type BandId,
} from "./climate-bands";
import { CLIMATE_DATA_CREDIT, climateForZip, createStationIndex, type StationIndex } from "./climate-lookup";
import type { JulyStation } from "./noaa";

const globalForIndex = globalThis as unknown as { __roostwrightStations?: Promise<StationIndex | null> };

/** The station index, built once per process from the imported normals; null when none were imported. */
export function getStationIndex(): Promise<StationIndex | null> {
  globalForIndex.__roostwrightStations ??= (async () => {
    const db = await getDb();
    const rows = await db.select().from(climateStations);
    if (rows.length === 0) return null;
    return createStationIndex(rows.map((r) => ({ ...r, flag: r.flag as JulyStation["flag"] })));
  })();
  const pending = globalForIndex.__roostwrightStations;
  // An empty table is not cached: an import later in the process's life is picked up.
  void pending.then((index) => {
    if (!index && globalForIndex.__roostwrightStations === pending) globalForIndex.__roostwrightStations = undefined;
  });
  return pending;
}

export const climateQuerySchema = z
  .object({
    zip: z.string().trim().optional(),
    julyHighF: queryDecimal(
      z
        .number({ error: "Type the July high as a number." })
        .min(-20, "A July high below -20 °F is not plausible; check the number.")
        .max(135, "A July high above 135 °F is not plausible; check the number.")
        .optional(),
    ),
    julyHighC: queryDecimal(
      z
        .number({ error: "Type the July high as a number." })
        .min(-29, "A July high below -29 °C is not plausible; check the number.")
        .max(57, "A July high above 57 °C is not plausible; check the number.")
        .optional(),
    ),
  })
  .refine((q) => [q.zip, q.julyHighF, q.julyHighC].filter((v) => v !== undefined && v !== "").length === 1, {
    message: "Give a ZIP code or a July high (in °F or °C), one of them.",
    path: ["zip"],
  });
export type ClimateQuery = z.infer<typeof climateQuerySchema>;

export type ClimateAnswer = {
  julyHighF: number;
  julyHighC: number;
  band: {
    id: BandId;
    label: string;
    rangeText: string;
    shades: readonly string[];
    ventsNeeded: boolean;
    afternoonShade: boolean;
    explanation: string;
  };
  zip?: string;
  stations?: { id: string; name: string; state: string; distanceMi: number; julyHighF: number; flag: string }[];
  nearEdge: BandEdge | null;
  credit?: string;
};

function answerFor(julyHighF: number): Omit<ClimateAnswer, "stations" | "zip"> {
  const band = bandForJulyHigh(julyHighF);
  return {
    julyHighF: Math.round(julyHighF * 10) / 10,
    julyHighC: Math.round(fahrenheitToCelsius(julyHighF) * 10) / 10,
    band: {
      id: band.id,
      label: band.label,
      rangeText: band.rangeText,
      shades: band.shades,
      ventsNeeded: band.ventsNeeded,
      afternoonShade: band.afternoonShade,
      explanation: band.explanation,
    },
    nearEdge: nearBandEdge(julyHighF),
  };
}

export async function resolveClimate(query: ClimateQuery): Promise<ClimateAnswer> {
  if (query.julyHighF !== undefined) return answerFor(query.julyHighF);
  if (query.julyHighC !== undefined) return answerFor(celsiusToFahrenheit(query.julyHighC));
  const index = await getStationIndex();
  if (!index) {
    throw new AppError(
      "unavailable",
      "The climate normals are not loaded on this store yet, so we cannot look up a ZIP code. Type your average July high instead.",
      { zip: "ZIP lookup is not available; type your July high instead." },
    );
  }
  const result = climateForZip(index, query.zip ?? "");
  if (!result.ok) throw new AppError("bad_request", result.message, { zip: result.message });
  return {
    ...answerFor(result.julyHighF),
    zip: result.zip,
    stations: result.stations.map((s) => ({ ...s, flag: s.flag ?? "" })),
    credit: CLIMATE_DATA_CREDIT,
  };
}
