import type { Role } from "@/lib/roles";

declare module "next-auth" {
  interface Session {
    user: { id: string; email: string; name: string; role: Role };
  }
  interface User {
    id: string;
    role: Role;
    /** The auth_sessions row of this sign-in. */
    sid: string;
  }
}

declare module "next-auth/jwt" {
  interface JWT {
    id: string;
    role: Role;
    /** The auth_sessions row of this sign-in; revoked rows end the session. */
    sid?: string;
  }
}
