/**
 * Signs out through the auth library's own endpoints, as its browser client's `signOut` does
 * (GET /api/auth/csrf, then POST /api/auth/signout with that token), without loading that client
 * on every page: the header's button is on all of them, and the client is 15 kB of script.
 * Resolves false when the server could not be reached; the session is then unchanged.
 */
export async function signOutInBrowser(callbackUrl = "/"): Promise<boolean> {
  try {
    const csrf = (await (await fetch("/api/auth/csrf")).json()) as { csrfToken?: string };
    if (!csrf.csrfToken) return false;
    const response = await fetch("/api/auth/signout", {
      method: "POST",
      headers: { "Content-Type": "application/x-www-form-urlencoded" },
      body: new URLSearchParams({ csrfToken: csrf.csrfToken, callbackUrl, json: "true" }),
    });
    if (!response.ok) return false;
    const { url } = (await response.json().catch(() => ({}))) as { url?: string };
    window.location.href = url ?? callbackUrl;
    return true;
  } catch {
    return false;
  }
}
