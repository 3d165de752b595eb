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
