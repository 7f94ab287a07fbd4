import NextAuth from "next-auth";
import { authOptions } from "@/lib/auth/options";
import { AppError } from "@/lib/http/errors";
import { gated, jsonError } from "@/lib/http/route";

const nextAuth = NextAuth(authOptions) as (request: Request, context: { params: Promise<{ nextauth: string[] }> }) => Promise<Response>;
// The sign-in form's e-mail and password pass the same input gate as every other route.
const post = gated(nextAuth);

// The store signs in with credentials only, and their callback takes a POST: a GET there would
// reach next-auth's OAuth path and fail with a 500, so it is answered here.
const get = gated(async (request: Request, context: { params: Promise<{ nextauth: string[] }> }) => {
  if (new URL(request.url).pathname.startsWith("/api/auth/callback/")) {
    return jsonError(new AppError("bad_request", "Sign in through the sign-in form; this address takes the form's POST only."));
  }
  return nextAuth(request, context);
});

export { get as GET, post as POST };
