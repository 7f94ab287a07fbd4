import type { ReactNode } from "react";

// Account pages are the signed-in buyer's own: nothing of them is shared, so they render per request
// and may wait for the session (no instant-navigation promise; the root layout's frame is still the
// prerendered shell).
export const instant = false;

export default function AccountLayout({ children }: { children: ReactNode }) {
  return children;
}
