import type { ReactNode } from "react";
import { requirePageUser } from "@/lib/auth/guard";

export default async function FulfillmentLayout({ children }: { children: ReactNode }) {
  await requirePageUser("fulfillment:orders", "/fulfillment");
  return children;
}
