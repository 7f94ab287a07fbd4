import { describe, expect, it } from "vitest";
import { resolveClientAddress, UNKNOWN_ADDRESS } from "@/lib/http/client-address";

// X-Forwarded-For: each proxy appends the address it received from (MDN, "X-Forwarded-For").
describe("the client address", () => {
  it("ignores forwarded headers with no trusted proxy", () => {
    expect(resolveClientAddress({ forwardedFor: "203.0.113.9", trustedProxies: 0 })).toBe(UNKNOWN_ADDRESS);
    expect(resolveClientAddress({ forwardedFor: "203.0.113.9", remoteAddress: "198.51.100.4", trustedProxies: 0 })).toBe("198.51.100.4");
    expect(resolveClientAddress({ remoteAddress: "::ffff:198.51.100.4", trustedProxies: 0 })).toBe("198.51.100.4");
  });

  it("takes the entry our nearest proxies wrote, never one the client chose", () => {
    // One proxy appended the client it saw; the client had sent "1.2.3.4" itself.
    expect(resolveClientAddress({ forwardedFor: "1.2.3.4, 203.0.113.9", trustedProxies: 1 })).toBe("203.0.113.9");
    expect(resolveClientAddress({ forwardedFor: "9.9.9.9, 203.0.113.9", trustedProxies: 1 })).toBe("203.0.113.9");
    // Two proxies: the outer one appended the client, the inner one the outer proxy.
    expect(resolveClientAddress({ forwardedFor: "1.2.3.4, 203.0.113.9, 10.0.0.2", trustedProxies: 2 })).toBe("203.0.113.9");
    // The connection known: it is the nearest proxy.
    expect(resolveClientAddress({ forwardedFor: "1.2.3.4, 203.0.113.9", remoteAddress: "10.0.0.2", trustedProxies: 1 })).toBe("203.0.113.9");
  });

  it("answers unknown for a chain shorter than the proxies or an entry that is no address", () => {
    expect(resolveClientAddress({ forwardedFor: "203.0.113.9", trustedProxies: 2 })).toBe(UNKNOWN_ADDRESS);
    expect(resolveClientAddress({ forwardedFor: "", trustedProxies: 1 })).toBe(UNKNOWN_ADDRESS);
    expect(resolveClientAddress({ forwardedFor: "1.2.3.4, not-an-ip", trustedProxies: 1 })).toBe(UNKNOWN_ADDRESS);
    expect(resolveClientAddress({ forwardedFor: "[2001:DB8::1]:443", trustedProxies: 1 })).toBe("2001:db8::1");
    expect(resolveClientAddress({ forwardedFor: "203.0.113.9:8080", trustedProxies: 1 })).toBe("203.0.113.9");
  });
});
