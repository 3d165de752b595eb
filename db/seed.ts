// Seeds the invented demo scenario. Idempotent: a second run changes nothing.
import bcrypt from "bcryptjs";
import { drizzle } from "drizzle-orm/node-postgres";
import { eq } from "drizzle-orm";
import { Pool } from "pg";
import { env } from "../lib/env";
import { demoAccounts, demoFirm } from "./demo-accounts";
import * as schema from "./schema";

async function main() {
  const pool = new Pool({ connectionString: env().DATABASE_URL });
  const db = drizzle(pool, { schema });
  try {
    await db.transaction(async (tx) => {
      const firm = await tx.select().from(schema.firms).where(eq(schema.firms.name, demoFirm.name)).limit(1);
      if (!firm.length) await tx.insert(schema.firms).values(demoFirm);
      for (const a of demoAccounts) {
        const existing = await tx.select({ id: schema.users.id }).from(schema.users).where(eq(schema.users.email, a.email)).limit(1);
        if (existing.length) continue;
        await tx.insert(schema.users).values({ email: a.email, name: a.name, role: a.role, passwordHash: await bcrypt.hash(a.password, 10) });
      }
    });
    console.log("demo data in place");
  } finally {
    await pool.end();
  }
}

main().catch((err) => {
  console.error(`seeding failed: ${err instanceof Error ? err.message : String(err)}`);
  process.exit(1);
});
