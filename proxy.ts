import { NextResponse, type NextRequest } from "next/server";

// Coarse redirects only: a visitor with no session cookie is sent to sign in before a protected
// area renders. Every page, action and route still checks the session and the role itself.
const PROTECTED = ["/account", "/staff", "/fulfillment", "/admin"];
const SESSION_COOKIES = ["next-auth.session-token", "__Secure-next-auth.session-token"];

export function proxy(request: NextRequest) {
  const { pathname, search } = request.nextUrl;
  const isProtected = PROTECTED.some((p) => pathname === p || pathname.startsWith(`${p}/`));
  if (!isProtected) return NextResponse.next();
  if (SESSION_COOKIES.some((name) => request.cookies.has(name))) return NextResponse.next();
  const url = request.nextUrl.clone();
  url.pathname = "/sign-in";
  url.search = `?next=${encodeURIComponent(pathname + search)}`;
  return NextResponse.redirect(url);
}

export const config = { matcher: ["/account/:path*", "/staff/:path*", "/fulfillment/:path*", "/admin/:path*"] };
