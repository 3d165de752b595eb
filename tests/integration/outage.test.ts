// The database stops, or hangs, while the app is serving: every route answers 503 with a clear
// body within a few seconds (it used to be 500 "internal", or a 20 s hang with the database
// frozen, /api/health included), and everything comes back by itself when the database does,
// without restarting the app. The test cluster is halted (stopped, data kept) or frozen (every
// server process stopped with SIGSTOP) by scripts/db.sh, and always resumed afterwards.
import { execFileSync } from "node:child_process";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { smallDocument } from "../support/fixtures";
import { expectCleanAnswer } from "../support/hygiene";
import { api, attemptSignIn, baseUrl, closeTestDb, makeUser, signIn } from "../support/server";

const cluster = (cmd: "halt" | "resume" | "freeze" | "thaw") => execFileSync("bash", ["scripts/db.sh", cmd, "--test"], { stdio: "pipe" }).toString();

let cookie = "";
let projectId = "";
let schemeId = "";
let user: Awaited<ReturnType<typeof makeUser>>;

beforeAll(async () => {
  user = await makeUser("designer");
  cookie = await signIn(user);
  projectId = (await api("/api/projects", { method: "POST", cookie, body: { name: "Outage", clientName: "Invented chapel" } })).json.project.id;
  schemeId = (await api(`/api/projects/${projectId}/schemes`, { method: "POST", cookie, body: { name: "A", document: smallDocument() } })).json.scheme.id;
  // The test's own pool must not hold connections across the outage.
  await closeTestDb();
});

afterAll(async () => {
  // Whatever happened above, the cluster is left running for the tests that follow.
  cluster("thaw");
  cluster("resume");
  await waitForHealth(20_000);
});

async function waitForHealth(withinMs: number): Promise<number> {
  const started = performance.now();
  for (;;) {
    const res = await fetch(`${baseUrl}/api/health`).catch(() => null);
    if (res?.status === 200) return performance.now() - started;
    if (performance.now() - started > withinMs) throw new Error(`the app did not recover within ${withinMs} ms`);
    await new Promise((r) => setTimeout(r, 250));
  }
}

type Probe = { label: string; path: string; method?: string; body?: unknown };
const probes = (): Probe[] => [
  { label: "health", path: "/api/health" },
  { label: "project list", path: "/api/projects" },
  { label: "project", path: `/api/projects/${projectId}` },
  { label: "scheme", path: `/api/schemes/${schemeId}` },
  { label: "estimate", path: `/api/schemes/${schemeId}/estimate` },
  { label: "revisions", path: `/api/schemes/${schemeId}/revisions` },
  { label: "save", path: `/api/schemes/${schemeId}`, method: "PUT", body: { version: 1, document: smallDocument() } },
  { label: "new project", path: "/api/projects", method: "POST", body: { name: "During outage", clientName: "Nobody" } },
  { label: "session", path: "/api/auth/session" },
];

/** Every probe at once, each timed: all must answer 503 in our words within `withinMs`. */
async function expectAllUnavailable(withinMs: number) {
  const results = await Promise.all(
    probes().map(async (p) => {
      const started = performance.now();
      const res = await api(p.path, { method: p.method, cookie, body: p.body });
      return { p, res, ms: performance.now() - started };
    }),
  );
  for (const { p, res, ms } of results) {
    expectCleanAnswer(res, p.label, { allowUnavailable: true });
    expect(res.status, `${p.label}: ${res.text.slice(0, 200)}`).toBe(503);
    const message = p.label === "health" ? res.json.reason : res.json.error.message;
    expect(message, p.label).toBe("The database is not answering; try again shortly.");
    expect(ms, `${p.label} took ${Math.round(ms)} ms`).toBeLessThan(withinMs);
  }
}

async function expectAllServing() {
  for (const p of probes().filter((p) => !p.method)) {
    const res = await api(p.path, { cookie });
    expect(res.status, `${p.label} after recovery: ${res.text.slice(0, 200)}`).toBe(200);
  }
}

describe("the database stops", () => {
  it("answers 503 on every route and says so at sign-in, then recovers by itself", async () => {
    await expectAllServing();
    cluster("halt");
    try {
      await expectAllUnavailable(5_000);
      const signInDuring = await attemptSignIn(user.email, user.password, "192.0.2.10");
      expect(signInDuring.error).toBe("The database is not answering; try again shortly.");
      // A screen cannot choose its status: the framework answers 500 and the browser then shows
      // app/error.tsx, which says the database is not answering (tests/e2e/outage.e2e.ts).
      const page = await fetch(`${baseUrl}/projects`, { headers: { cookie } });
      expect(page.status).toBe(500);
      expectCleanAnswer({ status: 200, text: await page.text() }, "projects page");
    } finally {
      cluster("resume");
    }
    await waitForHealth(15_000);
    await expectAllServing(); // same server process, same session cookie
  }, 60_000);
});

describe("the database hangs", () => {
  it("answers 503 within a few seconds instead of waiting, then recovers when it wakes", async () => {
    await expectAllServing(); // the pool holds live connections, which will now hang
    cluster("freeze");
    try {
      await expectAllUnavailable(10_000);
      // A second round meets the same frozen server through fresh connections: still quick.
      await expectAllUnavailable(10_000);
    } finally {
      cluster("thaw");
    }
    await waitForHealth(15_000);
    await expectAllServing();
  }, 90_000);
});
