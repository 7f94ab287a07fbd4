/**
 * Where to go after signing in: a same-site path only. "//host" and "/\host" are read by
 * browsers as another site (an open redirect would let a link send people elsewhere).
 * Common practice, no source.
 */
export function safeNext(next: unknown, fallback: string): string {
  return typeof next === "string" && next.startsWith("/") && !next.startsWith("//") && !next.startsWith("/\\") ? next : fallback;
}
