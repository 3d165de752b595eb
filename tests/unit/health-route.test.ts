// GET /api/health with the database out of reach: the handler itself, with a pool pointed at a
// loopback port where nothing listens (the running test server always has its database).
import { afterAll, describe, expect, it, vi } from "vitest";

vi.mock("server-only", () => ({}));

describe("GET /api/health", () => {
  const saved = process.env.DATABASE_URL;
  afterAll(() => {
    process.env.DATABASE_URL = saved;
  });

  it("answers 503 with a clear body when the database cannot be reached", async () => {
    process.env.DATABASE_URL = "postgres://stopwright@127.0.0.1:9/stopwright";
    vi.resetModules();
    (globalThis as { stopwrightPool?: unknown }).stopwrightPool = undefined;
    const { GET } = await import("@/app/api/health/route");
    const log = vi.spyOn(console, "error").mockImplementation(() => {});
    const res = await GET();
    expect(log.mock.calls[0]?.join(" ")).toMatch(/ECONNREFUSED/);
    log.mockRestore();
    expect(res.status).toBe(503);
    const body = await res.json();
    expect(body).toMatchObject({ status: "unavailable", database: "unreachable" });
    expect(body.reason).toBe("The database is not answering; try again shortly.");
    expect(res.headers.get("retry-after")).toBe("5");
    const { pool } = await import("@/db/client");
    await pool.end();
  });
});
