import { connection } from "next/server";
import { cachedCenterProfile } from "@/lib/catalog/cached";

// Small pieces of the center's settings for prerendered pages: each streams in at request time
// (the build never reads the settings), from the cache. Wrap each in <Suspense>.

/** The center's name as a kicker line, or nothing when its settings are not filled in. */
export async function CenterKicker({ className }: { className?: string }) {
  await connection();
  const center = await cachedCenterProfile();
  return center.configured ? <p className={className}>{center.name}</p> : null;
}

/** " in <city>" when the center's city is known, else nothing. */
export async function CenterCityClause() {
  await connection();
  const center = await cachedCenterProfile();
  return center.city ? <> in {center.city}</> : null;
}
