import NextAuth from "next-auth";
import { authOptions } from "@/lib/auth/options";
import { gated } from "@/lib/http/route";

const nextAuth = NextAuth(authOptions) as (request: Request, context: { params: Promise<{ nextauth: string[] }> }) => Promise<Response>;
// The sign-in form's e-mail and password pass the same input gate as every other route.
const handler = gated(nextAuth);

export { handler as GET, handler as POST };
