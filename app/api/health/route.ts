import { pool } from "@/db/client";

export const dynamic = "force-dynamic";

/** Public on purpose: says only whether the app can reach its database. */
export async function GET() {
  try {
    await pool.query("select 1");
    return Response.json({ status: "ok", database: "reachable" });
  } catch (err) {
    const reason = err instanceof Error ? err.message : String(err);
    return Response.json({ status: "unavailable", database: "unreachable", reason }, { status: 503 });
  }
}
