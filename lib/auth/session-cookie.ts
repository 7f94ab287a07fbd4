import "server-only";
import { cookies } from "next/headers";
import { encode } from "next-auth/jwt";
import { authOptions } from "./options";
import type { Role } from "./roles";

// A sign-in that arrives as a plain form post (no script on the page) starts the same session
// next-auth's credentials callback would: the token from the same jwt callback, encrypted with
// the same secret, in the cookie of the same name and options (next-auth 4, core/lib/cookie.js:
// `next-auth.session-token`, `__Secure-` prefixed on https, httpOnly, SameSite=Lax, path /).

const DEFAULT_MAX_AGE = 30 * 24 * 60 * 60;

function secureCookies(): boolean {
  return (process.env.NEXTAUTH_URL ?? "").startsWith("https://");
}

export function sessionCookieName(): string {
  return `${secureCookies() ? "__Secure-" : ""}next-auth.session-token`;
}

export async function startSession(user: { id: string; name: string; email: string; role: Role; sessionVersion: number }): Promise<void> {
  const maxAge = authOptions.session?.maxAge ?? DEFAULT_MAX_AGE;
  const defaultToken = { name: user.name, email: user.email, picture: undefined, sub: user.id };
  const jwtCallback = authOptions.callbacks?.jwt;
  const token = jwtCallback
    ? await jwtCallback({ token: defaultToken, user, account: null, trigger: "signIn" } as Parameters<typeof jwtCallback>[0])
    : defaultToken;
  const value = await encode({ token, secret: authOptions.secret!, maxAge });
  (await cookies()).set(sessionCookieName(), value, {
    httpOnly: true,
    sameSite: "lax",
    path: "/",
    secure: secureCookies(),
    expires: new Date(Date.now() + maxAge * 1000),
  });
}
