import "server-only";
import bcrypt from "bcryptjs";
import type { NextAuthOptions } from "next-auth";
import CredentialsProvider from "next-auth/providers/credentials";
import { createAuthSession, revokeAuthSession, SESSION_HOURS } from "@/db/queries/sessions";
import { getUserByEmail } from "@/db/queries/users";
import { appOrigin, authSecret } from "@/lib/env";
import { DATABASE_UNAVAILABLE_MESSAGE, databaseProblem } from "@/lib/server/db-errors";
import { clientAddress } from "@/lib/server/request-checks";
import { recordFailedSignIn, recordSuccessfulSignIn, signInPause } from "@/lib/server/sign-in-throttle";
import { signInErrors, signInSchema } from "@/lib/validation/users";

/** A refusal in our words, shown as it is on the sign-in form. */
class SignInRefusal extends Error {}

// Compared when there is no such user, so timing does not tell which e-mails exist.
const NO_USER_HASH = "$2b$10$invalidinvalidinvalidinvalidinvalidinvalidinvalidinva";

/**
 * Checks an e-mail and password. Returns the user with a new session id, or null for a wrong
 * password; throws an Error whose message the sign-in form shows (paused, disabled, database down).
 */
async function authorize(credentials: unknown, headers: Record<string, string | string[] | undefined>) {
  const parsed = signInSchema.safeParse(credentials);
  if (!parsed.success) return null;
  const attempt = { email: parsed.data.email, address: clientAddress(headers) };
  const paused = await signInPause(attempt);
  if (paused) throw new SignInRefusal(paused);
  const user = await getUserByEmail({ email: attempt.email });
  const ok = await bcrypt.compare(parsed.data.password, user?.passwordHash ?? NO_USER_HASH);
  if (!user || !ok) {
    const nowPaused = await recordFailedSignIn(attempt);
    if (nowPaused) throw new SignInRefusal(nowPaused);
    return null;
  }
  if (user.disabled) throw new SignInRefusal(signInErrors.disabled);
  await recordSuccessfulSignIn(attempt);
  const sid = await createAuthSession({ userId: user.id });
  return { id: user.id, email: user.email, name: user.name, role: user.role, sid };
}

export const authOptions: NextAuthOptions = {
  // Read when a request needs it, so a build needs no secret; a server without one never starts.
  get secret() {
    return authSecret();
  },
  // Secure, __Secure- prefixed cookies whenever the app is served over HTTPS.
  get useSecureCookies() {
    return appOrigin().startsWith("https:");
  },
  session: { strategy: "jwt", maxAge: SESSION_HOURS * 3600 },
  // Errors go back to our sign-in page, never to next-auth's own error page.
  pages: { signIn: "/sign-in", error: "/sign-in" },
  providers: [
    CredentialsProvider({
      name: "E-mail and password",
      credentials: { email: { label: "E-mail", type: "email" }, password: { label: "Password", type: "password" } },
      async authorize(credentials, req) {
        try {
          return await authorize(credentials, req?.headers ?? {});
        } catch (err) {
          // next-auth shows a thrown message to the person signing in: ours only, never a driver's.
          if (err instanceof SignInRefusal) throw new Error(err.message);
          if (databaseProblem(err) === "unavailable") throw new Error(DATABASE_UNAVAILABLE_MESSAGE);
          console.error("sign-in failed:", err);
          throw new Error("Sign-in failed on the server; try again.");
        }
      },
    }),
  ],
  callbacks: {
    async jwt({ token, user }) {
      if (user) {
        token.id = user.id;
        token.role = user.role;
        token.sid = user.sid;
      }
      return token;
    },
    async session({ session, token }) {
      session.user = { id: token.id, email: token.email ?? "", name: token.name ?? "", role: token.role };
      return session;
    },
  },
  events: {
    // The cookie is cleared by next-auth; the session row is revoked here, so a copy of the
    // cookie stops working too. (If the database is down, next-auth logs it and still clears the cookie.)
    async signOut({ token }) {
      if (typeof token?.sid === "string") await revokeAuthSession({ sessionId: token.sid });
    },
  },
};
