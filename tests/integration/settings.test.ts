// A production server never runs with a secret anyone could know: without NEXTAUTH_SECRET, or with
// a value published in the source, it refuses to start and says what to set. And a session token
// signed with the once-public default gets nowhere on a server with its own secret.
import { spawn } from "node:child_process";
import { encode } from "next-auth/jwt";
import { afterAll, describe, expect, it } from "vitest";
import { api, closeTestDb, makeUser } from "../support/server";

afterAll(closeTestDb);

const PUBLISHED_DEFAULT = "stopwright-local-development-secret";

/** Starts the test build on a spare port with the given settings; answers how it ended and what it said. */
function startServer(extra: Record<string, string | undefined>, port: number): Promise<{ code: number | null; output: string }> {
  return new Promise((resolve, reject) => {
    const env: NodeJS.ProcessEnv = {
      NODE_ENV: "production",
      PATH: process.env.PATH ?? "",
      NEXT_DIST_DIR: process.env.NEXT_DIST_DIR ?? ".next",
      NEXT_TELEMETRY_DISABLED: "1",
      DATABASE_URL: process.env.DATABASE_URL ?? "",
      NEXTAUTH_URL: `http://127.0.0.1:${port}`,
    };
    for (const [k, v] of Object.entries(extra)) if (v === undefined) delete env[k]; else env[k] = v;
    const child = spawn("node_modules/.bin/next", ["start", "-H", "127.0.0.1", "-p", String(port)], { env, stdio: ["ignore", "pipe", "pipe"] });
    let output = "";
    child.stdout.on("data", (d) => (output += d));
    child.stderr.on("data", (d) => (output += d));
    const timer = setTimeout(() => {
      child.kill("SIGKILL");
      reject(new Error(`the server kept running without a usable secret:\n${output}`));
    }, 30_000);
    child.on("exit", (code) => {
      clearTimeout(timer);
      resolve({ code, output });
    });
  });
}

describe("the signing secret", () => {
  it("a production server without NEXTAUTH_SECRET refuses to start and says what to set", async () => {
    const { code, output } = await startServer({ NEXTAUTH_SECRET: undefined }, 3191);
    expect(code).toBe(1);
    expect(output).toContain("NEXTAUTH_SECRET is not set");
    expect(output).toContain("openssl rand -hex 32");
  }, 40_000);

  it("refuses the value that was once the public default, and a short one", async () => {
    const published = await startServer({ NEXTAUTH_SECRET: PUBLISHED_DEFAULT }, 3192);
    expect(published.code).toBe(1);
    expect(published.output).toContain("published in Stopwright's source");
    const short = await startServer({ NEXTAUTH_SECRET: "too-short" }, 3193);
    expect(short.code).toBe(1);
    expect(short.output).toContain("only 9 characters long");
  }, 70_000);

  it("a session token forged with the published default gives no access", async () => {
    const admin = await makeUser("admin");
    const token = await encode({ token: { id: admin.id, role: "admin", email: admin.email, name: "Forged" }, secret: PUBLISHED_DEFAULT });
    const res = await api("/api/users", { cookie: `next-auth.session-token=${token}` });
    expect(res.status).toBe(401);
  });
});
