import type { ReactNode } from "react";
import { requirePageUser } from "@/lib/auth/guard";

// Workshop pages show live, per-person data and wait for it (no instant-navigation promise).
export const instant = false;

export default async function FulfillmentLayout({ children }: { children: ReactNode }) {
  await requirePageUser("fulfillment:orders", "/fulfillment");
  return children;
}
