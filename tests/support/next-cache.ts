import { vi } from "vitest";

// next/cache outside a Next.js server (integration tests call routes, actions and commands
// directly): "use cache" is a string there, so cached reads run every time; cacheTag and cacheLife
// do nothing; the expiring calls are recorded, so a test can check which tags a change touched.

export const expiredTags: string[] = [];

/** Forgets the recorded expiries (call it before the change under test). */
export function clearExpiredTags(): void {
  expiredTags.length = 0;
}

export const nextCacheMock = {
  cacheTag: () => undefined,
  cacheLife: () => undefined,
  updateTag: (tag: string) => void expiredTags.push(tag),
  revalidateTag: (tag: string) => void expiredTags.push(tag),
  revalidatePath: vi.fn(),
  refresh: () => undefined,
  unstable_cache: <T>(fn: T) => fn,
};
