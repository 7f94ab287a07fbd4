import type { ReactNode } from "react";
import { requirePageUser } from "@/lib/auth/guard";

export default async function AdminLayout({ children }: { children: ReactNode }) {
  await requirePageUser("admin:users", "/admin");
  return children;
}
