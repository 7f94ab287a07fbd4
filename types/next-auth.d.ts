import type { Role } from "@/lib/auth/roles";

declare module "next-auth" {
  interface Session {
    user?: { id?: string; name?: string | null; email?: string | null; role?: Role };
  }
  interface User {
    id: string;
    role: Role;
    sessionVersion?: number;
  }
}

declare module "next-auth/jwt" {
  interface JWT {
    id?: string;
    role?: Role;
    /** users.session_version at sign-in; a different value in the database ends the session. */
    sessionVersion?: number;
  }
}
