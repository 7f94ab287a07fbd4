import type { NextAuthOptions } from "next-auth";
import CredentialsProvider from "next-auth/providers/credentials";
import { getSessionFacts } from "./queries";
import { env } from "@/lib/config/env";
import { authenticate, clientAddress } from "./credentials";
import { isRole } from "./roles";

export const authOptions: NextAuthOptions = {
  secret: env().NEXTAUTH_SECRET,
  session: { strategy: "jwt", maxAge: 7 * 24 * 60 * 60 },
  pages: { signIn: "/sign-in", error: "/sign-in" },
  providers: [
    CredentialsProvider({
      name: "E-mail and password",
      credentials: { email: { type: "email" }, password: { type: "password" } },
      async authorize(credentials, req) {
        // A thrown error's message reaches the sign-in form as `error`.
        return authenticate(credentials, clientAddress(req?.headers));
      },
    }),
  ],
  callbacks: {
    async jwt({ token, user }) {
      if (user) {
        token.id = user.id;
        token.role = user.role;
        token.sessionVersion = user.sessionVersion ?? 0;
        return token;
      }
      // Re-read the role so an admin's change takes effect on the next request.
      if (typeof token.id === "string") {
        const row = await getSessionFacts({ id: token.id });
        // Gone, or signed in before a password reset or a role change: no session any more.
        if (!row || row.sessionVersion !== (token.sessionVersion ?? 0)) return { ...token, id: undefined, role: undefined };
        token.role = row.role;
        token.name = row.name;
      }
      return token;
    },
    async session({ session, token }) {
      if (session.user && typeof token.id === "string" && isRole(token.role)) {
        session.user.id = token.id;
        session.user.role = token.role;
      }
      return session;
    },
  },
};
