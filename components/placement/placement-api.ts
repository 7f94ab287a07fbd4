// Browser calls to the placement and saved-site routes. Errors come back as the store's one
// error shape, so forms can put each message beside its field.
import type { PlacementAnswer } from "@/lib/placement/placement-answer";
import { GUEST_SITE_TOKEN_HEADER, type SavedSiteReceipt } from "@/lib/placement/saved-site-schema";
import type { PlacementInput } from "@/lib/placement/schema";

export type ApiError = { code: string; message: string; fields?: Record<string, string> };

const OFFLINE: ApiError = {
  code: "network",
  message: "The store could not be reached. Check your connection and try again.",
};

async function send<T>(url: string, init: RequestInit): Promise<T> {
  let res: Response;
  try {
    res = await fetch(url, init);
  } catch (error) {
    if ((error as Error).name === "AbortError") throw error;
    throw OFFLINE;
  }
  const body = await res.json().catch(() => null);
  if (!res.ok)
    throw (
      (body?.error as ApiError | undefined) ?? {
        code: "internal",
        message: "That did not work; please try again.",
      }
    );
  return body as T;
}

const jsonInit = (body: unknown, signal?: AbortSignal): RequestInit => ({
  method: "POST",
  headers: { "content-type": "application/json" },
  body: JSON.stringify(body),
  signal,
});

export function requestPlacementCheck(input: PlacementInput, signal?: AbortSignal) {
  return send<PlacementAnswer>("/api/placement", jsonInit(input, signal));
}

export function requestSaveSite(body: { name: string; input: PlacementInput }) {
  return send<SavedSiteReceipt>("/api/sites", jsonInit(body));
}

export type SavedSiteDetail = {
  id: string;
  name: string;
  input: PlacementInput;
  result: PlacementAnswer;
  label: "good" | "fair" | "poor";
  bandId: string;
  createdAt: string;
};

const tokenHeaders = (guestToken?: string): HeadersInit =>
  guestToken ? { [GUEST_SITE_TOKEN_HEADER]: guestToken } : {};

export function requestSavedSite({ id, guestToken }: { id: string; guestToken?: string }) {
  return send<SavedSiteDetail>(`/api/sites/${encodeURIComponent(id)}`, {
    headers: tokenHeaders(guestToken),
  });
}

export function requestDeleteSite({ id, guestToken }: { id: string; guestToken?: string }) {
  return send<{ deleted: true }>(`/api/sites/${encodeURIComponent(id)}`, {
    method: "DELETE",
    headers: tokenHeaders(guestToken),
  });
}
