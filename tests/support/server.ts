// Helpers for integration tests: they talk to the production build that scripts/test.sh started,
// and to the throwaway database behind it. Each test makes its own users with unique e-mails.
import { randomUUID } from "node:crypto";
import bcrypt from "bcryptjs";
import { Pool } from "pg";
import type { Role } from "@/lib/roles";

export const baseUrl = process.env.E2E_BASE_URL ?? "http://127.0.0.1:3100";

let pool: Pool | undefined;
export function testDb(): Pool {
  pool ??= new Pool({ connectionString: process.env.DATABASE_URL, max: 3 });
  return pool;
}
export async function closeTestDb() {
  await pool?.end();
  pool = undefined;
}

export type TestUser = { id: string; email: string; password: string; role: Role };

export async function makeUser(role: Role, opts: { disabled?: boolean } = {}): Promise<TestUser> {
  const email = `${role}-${randomUUID().slice(0, 8)}@test.example`;
  const password = `pw-${randomUUID()}`;
  const hash = await bcrypt.hash(password, 4);
  const { rows } = await testDb().query(
    "insert into users (email, name, role, password_hash, disabled) values ($1, $2, $3, $4, $5) returning id",
    [email, `Test ${role}`, role, hash, opts.disabled ?? false],
  );
  return { id: rows[0].id, email, password, role };
}

/** Signs in the way a browser does (csrf cookie, then the credentials form); returns the cookie header. */
export async function signIn(user: Pick<TestUser, "email" | "password">): Promise<string> {
  const csrfRes = await fetch(`${baseUrl}/api/auth/csrf`);
  const { csrfToken } = (await csrfRes.json()) as { csrfToken: string };
  const jar = new Map<string, string>();
  const keep = (res: Response) => {
    for (const c of res.headers.getSetCookie()) {
      const [pair] = c.split(";");
      const i = pair!.indexOf("=");
      jar.set(pair!.slice(0, i), pair!.slice(i + 1));
    }
  };
  keep(csrfRes);
  const res = await fetch(`${baseUrl}/api/auth/callback/credentials`, {
    method: "POST",
    redirect: "manual",
    headers: { "content-type": "application/x-www-form-urlencoded", cookie: [...jar].map(([k, v]) => `${k}=${v}`).join("; ") },
    body: new URLSearchParams({ csrfToken, email: user.email, password: user.password, json: "true" }),
  });
  keep(res);
  if (![...jar.keys()].some((k) => k.includes("session-token"))) throw new Error(`sign-in failed for ${user.email}`);
  return [...jar].map(([k, v]) => `${k}=${v}`).join("; ");
}

export async function api(path: string, init: { method?: string; cookie?: string; body?: unknown; headers?: Record<string, string> } = {}) {
  const res = await fetch(`${baseUrl}${path}`, {
    method: init.method ?? "GET",
    headers: { ...(init.cookie ? { cookie: init.cookie } : {}), ...(init.body !== undefined ? { "content-type": "application/json" } : {}), ...init.headers },
    body: init.body === undefined ? undefined : typeof init.body === "string" ? init.body : JSON.stringify(init.body),
  });
  const text = await res.text();
  let json: unknown = undefined;
  try { json = JSON.parse(text); } catch { /* not JSON */ }
  // Tests read into the body freely; a wrong guess fails the assertion, which is what we want.
  // eslint-disable-next-line @typescript-eslint/no-explicit-any
  return { status: res.status, json: json as Record<string, any>, text };
}

/** A browser's way of signing out: the CSRF token for this cookie, then the sign-out form. */
export async function signOut(cookie: string): Promise<Response> {
  const csrf = await fetch(`${baseUrl}/api/auth/csrf`, { headers: { cookie } });
  const { csrfToken } = (await csrf.json()) as { csrfToken: string };
  return fetch(`${baseUrl}/api/auth/signout`, {
    method: "POST",
    redirect: "manual",
    headers: { "content-type": "application/x-www-form-urlencoded", cookie },
    body: new URLSearchParams({ csrfToken, callbackUrl: "/sign-in", json: "true" }),
  });
}

/**
 * One sign-in attempt as the sign-in form makes it, from the network address given (the test
 * server sits behind no proxy, so X-Forwarded-For is what the app reads). Returns the session
 * cookie on success, or the message the form would show.
 */
export async function attemptSignIn(email: string, password: string, address = "127.0.0.1"): Promise<{ cookie: string | null; error: string | null }> {
  const csrfRes = await fetch(`${baseUrl}/api/auth/csrf`);
  const { csrfToken } = (await csrfRes.json()) as { csrfToken: string };
  const csrfCookie = csrfRes.headers.getSetCookie().map((c) => c.split(";")[0]).join("; ");
  const res = await fetch(`${baseUrl}/api/auth/callback/credentials`, {
    method: "POST",
    redirect: "manual",
    headers: { "content-type": "application/x-www-form-urlencoded", cookie: csrfCookie, "x-forwarded-for": address },
    body: new URLSearchParams({ csrfToken, email, password, json: "true" }),
  });
  const session = res.headers.getSetCookie().map((c) => c.split(";")[0]!).find((c) => c.includes("session-token="));
  if (session) return { cookie: `${csrfCookie}; ${session}`, error: null };
  const { url } = (await res.json()) as { url: string };
  return { cookie: null, error: new URL(url).searchParams.get("error") };
}
