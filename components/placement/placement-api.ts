// Browser calls to the placement and saved-site routes. Errors come back as the store's one
// error shape, so forms can put each message beside its field.
import { fetchJson } from "@/lib/http/client";
import type { PlacementAnswer } from "@/lib/placement/placement-answer";
import { GUEST_SITE_TOKEN_HEADER, type SavedSiteReceipt } from "@/lib/placement/saved-site-schema";
import type { PlacementInput } from "@/lib/placement/schema";
import type { Rating } from "@/lib/shared/rating";

export { ApiError } from "@/lib/http/client";

const send = <T>(url: string, init: RequestInit): Promise<T> => fetchJson<T>(url, init);

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
  label: Rating;
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
