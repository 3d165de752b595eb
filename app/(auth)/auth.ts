import "server-only";
import bcrypt from "bcryptjs";
import type { NextAuthOptions } from "next-auth";
import CredentialsProvider from "next-auth/providers/credentials";
import { getUserByEmail } from "@/db/queries/users";
import { authSecret } from "@/lib/env";
import { signInErrors, signInSchema } from "@/lib/validation/users";

export const authOptions: NextAuthOptions = {
  // Read when a request needs it, so a build needs no secret; a server without one never starts.
  get secret() {
    return authSecret();
  },
  session: { strategy: "jwt", maxAge: 60 * 60 * 12 },
  pages: { signIn: "/sign-in" },
  providers: [
    CredentialsProvider({
      name: "E-mail and password",
      credentials: { email: { label: "E-mail", type: "email" }, password: { label: "Password", type: "password" } },
      async authorize(credentials) {
        const parsed = signInSchema.safeParse(credentials);
        if (!parsed.success) return null;
        const user = await getUserByEmail({ email: parsed.data.email });
        // Compare even when there is no user, so timing does not tell which e-mails exist.
        const ok = await bcrypt.compare(parsed.data.password, user?.passwordHash ?? "$2b$10$invalidinvalidinvalidinvalidinvalidinvalidinvalidinva");
        if (!user || !ok) return null;
        if (user.disabled) throw new Error(signInErrors.disabled);
        return { id: user.id, email: user.email, name: user.name, role: user.role };
      },
    }),
  ],
  callbacks: {
    async jwt({ token, user }) {
      if (user) {
        token.id = user.id;
        token.role = user.role;
      }
      return token;
    },
    async session({ session, token }) {
      session.user = { id: token.id, email: token.email ?? "", name: token.name ?? "", role: token.role };
      return session;
    },
  },
};
