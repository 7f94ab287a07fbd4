// Whether an address path decodes: each segment must be valid percent-encoding of UTF-8
// (RFC 3986 §2.1: "%" followed by two hex digits; the bytes then UTF-8 per RFC 3629, so an
// overlong form such as %C0%AF is refused too). decodeURIComponent applies exactly these rules
// (ECMAScript 2024, §19.2.6.5 Decode) and throws a URIError otherwise.

/** The first segment of `pathname` that does not decode, or null when every one does. */
export function malformedPathSegment(pathname: string): string | null {
  for (const segment of pathname.split("/")) {
    if (!segment.includes("%")) continue;
    try {
      decodeURIComponent(segment);
    } catch {
      return segment;
    }
  }
  return null;
}
