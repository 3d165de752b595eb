import { pool } from "@/db/client";
import { RETRY_AFTER_SECONDS } from "@/lib/server/errors";
import { DATABASE_UNAVAILABLE_MESSAGE } from "@/lib/server/db-errors";

export const dynamic = "force-dynamic";

/** Public on purpose: says only whether the app can reach its database. */
export async function GET() {
  try {
    await pool.query("select 1");
    return Response.json({ status: "ok", database: "reachable" }, { headers: { "cache-control": "no-store" } });
  } catch (err) {
    // The cause goes to the server log; the public answer does not show addresses.
    console.error("health check: database unreachable:", err instanceof Error ? err.message : err);
    return Response.json(
      { status: "unavailable", database: "unreachable", reason: DATABASE_UNAVAILABLE_MESSAGE },
      { status: 503, headers: { "cache-control": "no-store", "retry-after": String(RETRY_AFTER_SECONDS) } },
    );
  }
}
