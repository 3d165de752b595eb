// Security headers on every answer, a Content-Security-Policy whose script nonce is fresh for each
// page and carried by every script the page has, and Secure cookies when served over HTTPS.
import { spawn, type ChildProcess } from "node:child_process";
import { createServer } from "node:net";
import { afterAll, describe, expect, it } from "vitest";
import { api, baseUrl, closeTestDb, makeUser, signIn } from "../support/server";

afterAll(closeTestDb);

function expectCommonHeaders(h: Headers, label: string) {
  expect(h.get("x-content-type-options"), label).toBe("nosniff");
  expect(h.get("referrer-policy"), label).toBe("same-origin");
  expect(h.get("x-frame-options"), label).toBe("DENY");
  expect(h.get("permissions-policy"), label).toMatch(/camera=\(\), microphone=\(\), geolocation=\(\)/);
}

function scriptSrc(csp: string): string {
  return csp.split(";").map((d) => d.trim()).find((d) => d.startsWith("script-src "))!;
}

describe("security headers", () => {
  it("gives every page a fresh nonce, carried by each of its scripts, and no inline-script exception", async () => {
    const nonces = new Set<string>();
    for (let i = 0; i < 2; i++) {
      const res = await fetch(`${baseUrl}/sign-in`);
      const html = await res.text();
      expectCommonHeaders(res.headers, "sign-in page");
      const csp = res.headers.get("content-security-policy")!;
      expect(csp).toMatch(/frame-ancestors 'none'/);
      expect(csp).toMatch(/object-src 'none'/);
      expect(csp).toMatch(/base-uri 'self'/);
      const scripts = scriptSrc(csp);
      expect(scripts).not.toMatch(/unsafe-inline|unsafe-eval/);
      const nonce = /'nonce-([^']+)'/.exec(scripts)![1]!;
      nonces.add(nonce);
      const tags = html.match(/<script\b[^>]*>/g) ?? [];
      expect(tags.length).toBeGreaterThan(0);
      for (const tag of tags) expect(tag, tag).toContain(`nonce="${nonce}"`);
    }
    expect(nonces.size).toBe(2);
  });

  it("sets them on signed-in pages, the API, redirects, refusals and static files", async () => {
    const cookie = await signIn(await makeUser("designer"));
    const page = await fetch(`${baseUrl}/projects`, { headers: { cookie } });
    expectCommonHeaders(page.headers, "projects page");
    expect(page.headers.get("content-security-policy")).toMatch(/script-src 'self' 'nonce-/);
    const html = await page.text();
    const asset = /\/_next\/static\/[^"]+\.js/.exec(html)![0];
    const staticFile = await fetch(`${baseUrl}${asset}`);
    expect(staticFile.status).toBe(200);
    expectCommonHeaders(staticFile.headers, "static file");

    const json = await fetch(`${baseUrl}/api/projects`, { headers: { cookie } });
    expectCommonHeaders(json.headers, "API");
    const redirect = await fetch(`${baseUrl}/projects`, { redirect: "manual" });
    expect(redirect.status).toBe(307);
    expectCommonHeaders(redirect.headers, "redirect to sign-in");
    const refused = await api("/api/projects", { method: "POST", cookie, body: {}, headers: { origin: "http://elsewhere.example" } });
    expect(refused.status).toBe(403);
    const health = await fetch(`${baseUrl}/api/health`);
    expectCommonHeaders(health.headers, "health");
    expect(health.headers.get("strict-transport-security")).toBeNull(); // plain http here
  });
});

/** A free loopback port, from the system. */
async function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const s = createServer();
    s.once("error", reject);
    s.listen(0, "127.0.0.1", () => {
      const { port } = s.address() as { port: number };
      s.close(() => resolve(port));
    });
  });
}

describe("served over HTTPS", () => {
  let server: ChildProcess | undefined;
  afterAll(() => {
    server?.kill();
  });

  it("marks the session and CSRF cookies Secure, and adds HSTS and upgrade-insecure-requests", async () => {
    // The same build, started as it would run behind a TLS proxy: NEXTAUTH_URL says https.
    const port = await freePort();
    const origin = `https://127.0.0.1:${port}`;
    // The test runner's NODE_ENV=test is not the server's; `next start` sets its own.
    const env: Record<string, string | undefined> = { ...process.env, NEXTAUTH_URL: origin };
    delete env.NODE_ENV;
    server = spawn("node_modules/.bin/next", ["start", "-H", "127.0.0.1", "-p", String(port)], {
      env: env as NodeJS.ProcessEnv,
      stdio: "ignore",
    });
    const local = `http://127.0.0.1:${port}`;
    for (let i = 0; i < 80; i++) {
      if ((await fetch(`${local}/api/health`).catch(() => null))?.ok) break;
      await new Promise((r) => setTimeout(r, 250));
    }
    const user = await makeUser("designer");
    const csrf = await fetch(`${local}/api/auth/csrf`);
    const csrfCookies = csrf.headers.getSetCookie();
    expect(csrfCookies.find((c) => c.startsWith("__Host-next-auth.csrf-token="))).toMatch(/; Secure/i);
    const { csrfToken } = (await csrf.json()) as { csrfToken: string };
    const res = await fetch(`${local}/api/auth/callback/credentials`, {
      method: "POST",
      redirect: "manual",
      headers: { "content-type": "application/x-www-form-urlencoded", origin, cookie: csrfCookies.map((c) => c.split(";")[0]).join("; ") },
      body: new URLSearchParams({ csrfToken, email: user.email, password: user.password, json: "true" }),
    });
    const session = res.headers.getSetCookie().find((c) => c.startsWith("__Secure-next-auth.session-token="));
    expect(session).toBeDefined();
    expect(session).toMatch(/; Secure/i);
    expect(session).toMatch(/; HttpOnly/i);
    expect(session).toMatch(/; SameSite=Lax/i);
    // The secure cookie is the one the app reads back.
    const cookie = session!.split(";")[0]!;
    expect((await fetch(`${local}/api/projects`, { headers: { cookie } })).status).toBe(200);
    const page = await fetch(`${local}/sign-in`);
    expect(page.headers.get("strict-transport-security")).toMatch(/max-age=\d+/);
    expect(page.headers.get("content-security-policy")).toMatch(/upgrade-insecure-requests/);
  }, 60_000);
});
