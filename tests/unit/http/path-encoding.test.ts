import { describe, expect, it } from "vitest";
import { malformedPathSegment } from "@/lib/http/path-encoding";

describe("malformedPathSegment (RFC 3986 §2.1 percent-encoding of UTF-8, RFC 3629)", () => {
  it.each([
    ["/api/sites/%E0%A4%A", "%E0%A4%A"], // a three-byte sequence cut short
    ["/api/fulfillment/orders/%ZZ/transition", "%ZZ"], // not hex
    ["/api/staff/models/%/stock-movements", "%"], // a lone percent sign
    ["/media/%C0%AF", "%C0%AF"], // an overlong "/" (RFC 3629 §3 forbids it)
    ["/api/houses/ok/%E2%82", "%E2%82"], // the euro sign, one byte short
  ])("refuses %s at %s", (path, segment) => {
    expect(malformedPathSegment(path)).toBe(segment);
  });

  it.each(["/", "/houses/hollow-four", "/api/houses/%E2%82%AC", "/api/sites/a%20b", "/media/models/x/640.webp", "/api/houses/a%00b"])(
    "lets %s through (it decodes; what it decodes to is the route's to judge)",
    (path) => {
      expect(malformedPathSegment(path)).toBeNull();
    },
  );
});
