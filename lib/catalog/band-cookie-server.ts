import "server-only";
import { cookies } from "next/headers";
import { BAND_COOKIE, parseBandChoice, type BandChoice } from "./band-choice";

/** The buyer's chosen band, if they chose one on this browser. */
export async function getBandChoice(): Promise<BandChoice | null> {
  return parseBandChoice((await cookies()).get(BAND_COOKIE)?.value);
}
