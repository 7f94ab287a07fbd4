"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { useToast } from "@/components/ui/toast";
import { fetchJson, isApiError, type FieldErrors } from "@/lib/http/client";

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
      const data = await fetchJson<unknown>(path, {
        json: body,
        fallbackMessage: "That didn't work. Please try again.",
        offlineMessage: "The shipping desk could not be reached. Check the connection and try again.",
      });
      setConflict(null);
      toast.notify({ tone: "good", title: success });
      router.refresh();
      return { ok: true, data };
    } catch (error) {
      if (!isApiError(error)) throw error;
      const { status, message, fields } = error;
      if (status === 409) setConflict(message);
      else if (!fields) setError(message);
      return { ok: false, status, message, ...(fields ? { fields } : {}) };
    } finally {
      setPending(false);
    }
  }

  return { run, pending, conflict, error, reload: () => { setConflict(null); router.refresh(); } };
}
