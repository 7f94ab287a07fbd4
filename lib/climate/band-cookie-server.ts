import "server-only";
import { cookies } from "next/headers";
import { BAND_COOKIE, type BandChoice } from "./band-cookie";
import { parseBandChoice } from "./band-cookie-parse";

/** The buyer's chosen band and what they gave for it, if they chose one on this browser. */
export async function getBandChoice(): Promise<BandChoice | null> {
  return parseBandChoice((await cookies()).get(BAND_COOKIE)?.value);
}
