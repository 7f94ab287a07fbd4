"use client";

import type { ReactNode } from "react";
import { ToastProvider } from "@/components/ui/toast";

/** Client-side providers for every page: toasts. (Data fetching wraps itself: components/with-queries.tsx.) */
export function Providers({ children }: { children: ReactNode }) {
  return <ToastProvider>{children}</ToastProvider>;
}
