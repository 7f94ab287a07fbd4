import type { ReactNode } from "react";
import { requirePageUser } from "@/lib/auth/guard";

// Workshop pages show live, per-person data and wait for it (no instant-navigation promise).
export const instant = false;

// Every page below checks the role again next to its data; this layout is the first gate.
export default async function StaffLayout({ children }: { children: ReactNode }) {
  await requirePageUser("staff:models", "/staff");
  return children;
}
