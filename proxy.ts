import { NextResponse, type NextRequest } from "next/server";
import { malformedPathSegment } from "@/lib/http/path-encoding";

// Two coarse jobs before any route runs; every page, action and route still checks the session,
// the role and its own input itself.
// 1. An address whose percent-encoding does not decode (`/api/sites/%E0%A4%A`, `/media/%ZZ`) is
//    answered 400 in the store's error shape: the built router would otherwise fail while
//    decoding the dynamic segment, before any handler of ours runs, and answer 500.
// 2. A visitor with no session cookie is sent to sign in before a protected area renders.
const PROTECTED = ["/account", "/staff", "/fulfillment", "/admin"];
const SESSION_COOKIES = ["next-auth.session-token", "__Secure-next-auth.session-token"];

export function proxy(request: NextRequest) {
  const { pathname, search } = request.nextUrl;
  const bad = malformedPathSegment(pathname);
  if (bad !== null) {
    const message = "The address has a malformed percent-encoding.";
    return NextResponse.json({ error: { code: "bad_request", message, fields: { path: message } } }, { status: 400 });
  }
  const isProtected = PROTECTED.some((p) => pathname === p || pathname.startsWith(`${p}/`));
  if (!isProtected) return NextResponse.next();
  if (SESSION_COOKIES.some((name) => request.cookies.has(name))) return NextResponse.next();
  const url = request.nextUrl.clone();
  url.pathname = "/sign-in";
  url.search = `?next=${encodeURIComponent(pathname + search)}`;
  return NextResponse.redirect(url);
}

// Everything but the build's own static files (hashed names, never percent-encoded).
export const config = { matcher: ["/((?!_next/static|_next/image).*)"] };
