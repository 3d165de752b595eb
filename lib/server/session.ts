import "server-only";
import { decode, type JWT } from "next-auth/jwt";
import { LRUCache } from "lru-cache";
import { cookies } from "next/headers";
import { cache } from "react";
import { getLiveSession, type LiveSession } from "@/db/queries/sessions";
import { appOrigin, authSecret } from "@/lib/env";

/** next-auth's session cookie: `__Secure-` prefixed over HTTPS (authOptions.useSecureCookies). */
export function sessionCookieName(): string {
  return `${appOrigin().startsWith("https:") ? "__Secure-" : ""}next-auth.session-token`;
}

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/**
 * Tokens already decrypted by this process, by their exact text: a forged token cannot match one,
 * and each use still checks the expiry and, in the database, that the session is live. Saves the
 * key derivation and decryption (about a tenth of a scheme read's time) on every request.
 */
const decoded = new LRUCache<string, JWT>({ max: 10_000 });

async function decodeToken(value: string): Promise<JWT | null> {
  let token: JWT | null | undefined = decoded.get(value);
  if (!token) {
    try {
      token = await decode({ token: value, secret: authSecret() });
    } catch {
      return null;
    }
    if (!token) return null;
    decoded.set(value, token);
  }
  return typeof token.exp === "number" && token.exp * 1000 > Date.now() ? token : null;
}

/** The signed session token of this request, decoded, or null (absent, forged, expired). */
async function readToken(): Promise<JWT | null> {
  const jar = await cookies();
  const name = sessionCookieName();
  // next-auth splits a token over 4 KB into name.0, name.1, …; ours is far smaller, but read both forms.
  const value =
    jar.get(name)?.value ??
    jar
      .getAll()
      .filter((c) => c.name.startsWith(`${name}.`))
      .sort((a, b) => Number(a.name.slice(name.length + 1)) - Number(b.name.slice(name.length + 1)))
      .map((c) => c.value)
      .join("");
  return value ? decodeToken(value) : null;
}

/**
 * This request's session as the database knows it now: null when signed out, or when the session
 * was revoked (sign-out, account disabled, role changed), expired, or belongs to a disabled
 * account. Database errors are thrown (503), never taken for "signed out". Once per request.
 */
export const currentSession = cache(async (): Promise<LiveSession | null> => {
  const token = await readToken();
  const sid = token?.sid;
  if (typeof sid !== "string" || !UUID.test(sid)) return null;
  const live = await getLiveSession({ sessionId: sid });
  return live && live.user.id === token!.id ? live : null;
});
