"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { useToast } from "@/components/ui/toast";
import type { FieldErrors } from "@/lib/http/errors";

export type ActionOutcome = { ok: true; data: unknown } | { ok: false; status: number; message: string; fields?: FieldErrors };

/**
 * Posts one order action to its route and reloads the page's data on success. A 409 keeps its
 * message on screen (someone else moved the order, or it moved on) with a way to reload.
 */
export function useOrderAction() {
  const router = useRouter();
  const toast = useToast();
  const [pending, setPending] = useState(false);
  const [conflict, setConflict] = useState<string | null>(null);
  const [error, setError] = useState<string | null>(null);

  async function run(path: string, body: unknown, success: string): Promise<ActionOutcome> {
    setPending(true);
    setError(null);
    try {
      const res = await fetch(path, { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify(body) });
      const json = await res.json().catch(() => null);
      if (res.ok) {
        setConflict(null);
        toast.notify({ tone: "good", title: success });
        router.refresh();
        return { ok: true, data: json };
      }
      const message: string = json?.error?.message ?? "That didn't work. Please try again.";
      if (res.status === 409) setConflict(message);
      else if (!json?.error?.fields) setError(message);
      return { ok: false, status: res.status, message, fields: json?.error?.fields };
    } catch {
      const message = "The shipping desk could not be reached. Check the connection and try again.";
      setError(message);
      return { ok: false, status: 0, message };
    } finally {
      setPending(false);
    }
  }

  return { run, pending, conflict, error, reload: () => { setConflict(null); router.refresh(); } };
}
