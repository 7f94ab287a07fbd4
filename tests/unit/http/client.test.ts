import { afterEach, describe, expect, it, vi } from "vitest";
import { ApiError, applyFieldErrors, DEFAULT_FAILURE_MESSAGE, fetchJson, OFFLINE_MESSAGE } from "@/lib/http/client";

const answer = (body: string, status: number, type = "application/json") =>
  vi.fn(async () => new Response(body, { status, headers: { "content-type": type } }));

afterEach(() => vi.unstubAllGlobals());

async function failure(promise: Promise<unknown>): Promise<ApiError> {
  const error = await promise.then(
    () => null,
    (e: unknown) => e,
  );
  expect(error).toBeInstanceOf(ApiError);
  return error as ApiError;
}

describe("fetchJson", () => {
  it("returns the parsed JSON of a 2xx answer", async () => {
    vi.stubGlobal("fetch", answer(JSON.stringify({ items: [1, 2] }), 200));
    await expect(fetchJson<{ items: number[] }>("/api/x")).resolves.toEqual({ items: [1, 2] });
  });

  it("sends `json` as a POST body with its content type", async () => {
    const fetchMock = answer("{}", 200);
    vi.stubGlobal("fetch", fetchMock);
    await fetchJson("/api/cart/quote", { json: { lines: [] } });
    const [url, init] = fetchMock.mock.calls[0] as unknown as [string, RequestInit];
    expect(url).toBe("/api/cart/quote");
    expect(init.method).toBe("POST");
    expect(init.body).toBe('{"lines":[]}');
    expect(init.headers).toEqual({ "content-type": "application/json" });
  });

  it("turns the store's error shape into ApiError with status, code, message and fields", async () => {
    const body = { error: { code: "bad_request", message: "Check the highlighted fields.", fields: { zip: "Enter a 5-digit ZIP code." } } };
    vi.stubGlobal("fetch", answer(JSON.stringify(body), 400));
    const error = await failure(fetchJson("/api/climate"));
    expect({ status: error.status, code: error.code, message: error.message, fields: error.fields }).toEqual({
      status: 400,
      code: "bad_request",
      message: "Check the highlighted fields.",
      fields: { zip: "Enter a 5-digit ZIP code." },
    });
  });

  it("answers a proxy's HTML 502 with the caller's fallback message", async () => {
    vi.stubGlobal("fetch", answer("<html><body>Bad Gateway</body></html>", 502, "text/html"));
    const error = await failure(fetchJson("/api/houses", { fallbackMessage: "The catalog could not be loaded." }));
    expect({ status: error.status, code: error.code, message: error.message, fields: error.fields }).toEqual({
      status: 502,
      code: "unavailable",
      message: "The catalog could not be loaded.",
      fields: undefined,
    });
  });

  it("uses the default message for an error without the store's shape", async () => {
    vi.stubGlobal("fetch", answer(JSON.stringify({ error: "nope" }), 404));
    const error = await failure(fetchJson("/api/x"));
    expect([error.status, error.code, error.message]).toEqual([404, "internal", DEFAULT_FAILURE_MESSAGE]);
  });

  it("turns a network failure into ApiError with status 0", async () => {
    vi.stubGlobal(
      "fetch",
      vi.fn(async () => {
        throw new TypeError("Failed to fetch");
      }),
    );
    const error = await failure(fetchJson("/api/x"));
    expect([error.status, error.code, error.message]).toEqual([0, "network", OFFLINE_MESSAGE]);
  });

  it("lets an abort through as it is", async () => {
    const abort = new DOMException("The operation was aborted.", "AbortError");
    vi.stubGlobal(
      "fetch",
      vi.fn(async () => {
        throw abort;
      }),
    );
    await expect(fetchJson("/api/x")).rejects.toBe(abort);
  });

  it("refuses a 2xx answer that is not JSON", async () => {
    vi.stubGlobal("fetch", answer("<html>ok</html>", 200, "text/html"));
    const error = await failure(fetchJson("/api/x", { fallbackMessage: "The queue could not be loaded." }));
    expect([error.status, error.message]).toEqual([200, "The queue could not be loaded."]);
  });
});

describe("applyFieldErrors", () => {
  it("puts each field's message on its field and says whether any applied", () => {
    const setError = vi.fn();
    const error = new ApiError(400, "bad_request", "Check the fields.", { count: "Enter a whole number.", note: "Too long." });
    expect(applyFieldErrors(error, setError)).toBe(true);
    expect(setError.mock.calls).toEqual([
      ["count", { type: "server", message: "Enter a whole number." }],
      ["note", { type: "server", message: "Too long." }],
    ]);
  });

  it("keeps to the listed fields, and applies nothing without fields", () => {
    const setError = vi.fn();
    expect(applyFieldErrors(new ApiError(409, "conflict", "x", { reason: "Say why.", other: "y" }), setError, { only: ["reason"] })).toBe(true);
    expect(setError).toHaveBeenCalledTimes(1);
    expect(applyFieldErrors(new ApiError(500, "internal", "x"), setError)).toBe(false);
    expect(applyFieldErrors(null, setError)).toBe(false);
  });
});
