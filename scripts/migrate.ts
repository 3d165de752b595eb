// Applies the committed SQL migrations in drizzle/ to DATABASE_URL.
import { drizzle } from "drizzle-orm/node-postgres";
import { migrate } from "drizzle-orm/node-postgres/migrator";
import { Pool } from "pg";
import { env } from "../lib/env";

async function main() {
  const pool = new Pool({ connectionString: env().DATABASE_URL });
  try {
    await migrate(drizzle(pool), { migrationsFolder: "drizzle" });
    console.log("migrations applied");
  } finally {
    await pool.end();
  }
}

main().catch((err) => {
  console.error(`migration failed: ${err instanceof Error ? err.message : String(err)}`);
  process.exit(1);
});
