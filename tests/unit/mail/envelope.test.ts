import { describe, expect, it } from "vitest";
import { crossesLowStock } from "@/lib/mail/low-stock";
import { classifySendError } from "@/lib/mail/send-outcome";
import { buildUnsubscribeHeaders } from "@/lib/mail/unsubscribe-headers";

describe("one-click unsubscribe headers", () => {
  it("match the example of RFC 8058 section 8.1", () => {
    // RFC 8058 (2017), 8.1: List-Unsubscribe: <https://example.com/unsubscribe/opaquepart>
    //                       List-Unsubscribe-Post: List-Unsubscribe=One-Click
    expect(buildUnsubscribeHeaders({ url: "https://example.com/unsubscribe/opaquepart" })).toEqual({
      "List-Unsubscribe": "<https://example.com/unsubscribe/opaquepart>",
      "List-Unsubscribe-Post": "List-Unsubscribe=One-Click",
    });
  });

  it("refuses a URL that is not http(s)", () => {
    expect(() => buildUnsubscribeHeaders({ url: "mailto:stop@example.com" })).toThrow(RangeError);
  });
});

describe("reading the mail service's errors", () => {
  it("retries outages, limits and key problems", () => {
    expect(classifySendError({ name: "application_error", statusCode: 503 })).toBe("retry");
    expect(classifySendError({ name: "application_error", statusCode: null })).toBe("retry");
    expect(classifySendError({ name: "rate_limit_exceeded", statusCode: 429 })).toBe("retry");
    expect(classifySendError({ name: "invalid_api_key", statusCode: 403 })).toBe("retry");
    expect(classifySendError({ name: "concurrent_idempotent_requests", statusCode: 409 })).toBe(
      "retry",
    );
  });

  it("gives up on malformed messages", () => {
    expect(classifySendError({ name: "validation_error", statusCode: 422 })).toBe("give-up");
    expect(classifySendError({ name: "missing_required_field", statusCode: 422 })).toBe("give-up");
    expect(classifySendError({ name: "security_error", statusCode: 400 })).toBe("give-up");
  });

  it("treats a key reused with another body as already sent", () => {
    expect(classifySendError({ name: "invalid_idempotent_request", statusCode: 409 })).toBe(
      "already-sent",
    );
  });
});

describe("the low-stock crossing", () => {
  it("fires once, when stock goes from at-or-above the threshold to below it", () => {
    expect(crossesLowStock({ before: 4, after: 3, threshold: 4 })).toBe(true);
    expect(crossesLowStock({ before: 5, after: 0, threshold: 4 })).toBe(true);
    expect(crossesLowStock({ before: 4, after: 4, threshold: 4 })).toBe(false);
    expect(crossesLowStock({ before: 3, after: 2, threshold: 4 })).toBe(false);
    expect(crossesLowStock({ before: 2, after: 5, threshold: 4 })).toBe(false);
    expect(crossesLowStock({ before: 0, after: 0, threshold: 0 })).toBe(false);
  });
});
