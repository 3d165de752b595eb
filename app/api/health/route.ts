import { pool } from "@/db/client";

export const dynamic = "force-dynamic";

/** Public on purpose: says only whether the app can reach its database. */
export async function GET() {
  try {
    await pool.query("select 1");
    return Response.json({ status: "ok", database: "reachable" });
  } catch (err) {
    // The cause goes to the server log; the public answer does not show addresses.
    console.error("health check: database unreachable:", err instanceof Error ? err.message : err);
    return Response.json({ status: "unavailable", database: "unreachable", reason: "The database did not answer." }, { status: 503 });
  }
}
