// Seeds the invented demo scenario. Idempotent: a second run changes nothing.
import bcrypt from "bcryptjs";
import { drizzle } from "drizzle-orm/node-postgres";
import { eq } from "drizzle-orm";
import { Pool } from "pg";
import { env } from "../lib/env";
import { schemeDocumentSchema } from "../lib/spec/document";
import { demoAccounts, demoFirm } from "./demo-accounts";
import { demoProjects } from "./demo-scenario";
import { insertScheme } from "./scheme-store";
import * as schema from "./schema";

async function main() {
  const pool = new Pool({ connectionString: env().DATABASE_URL });
  const db = drizzle(pool, { schema });
  try {
    await db.transaction(async (tx) => {
      const firm = await tx.select().from(schema.firms).where(eq(schema.firms.name, demoFirm.name)).limit(1);
      if (!firm.length) await tx.insert(schema.firms).values(demoFirm);

      const ids = new Map<string, string>();
      for (const a of demoAccounts) {
        const [existing] = await tx.select({ id: schema.users.id }).from(schema.users).where(eq(schema.users.email, a.email)).limit(1);
        const id = existing?.id ?? (await tx.insert(schema.users).values({ email: a.email, name: a.name, role: a.role, passwordHash: await bcrypt.hash(a.password, 10) }).returning())[0]!.id;
        ids.set(a.role, id);
      }

      for (const demo of demoProjects) {
        const [existing] = await tx.select({ id: schema.projects.id }).from(schema.projects).where(eq(schema.projects.name, demo.project.name)).limit(1);
        if (existing) continue;
        const [project] = await tx.insert(schema.projects).values({ ...demo.project, createdById: ids.get("designer") }).returning();
        // The tonal director and the estimator work on every demo project; the committee member only on St Aldric's.
        const members = ["designer", "estimator", "workshop", ...(demo.schemes.length ? ["client"] : [])];
        await tx.insert(schema.projectMembers).values(members.map((r) => ({ projectId: project!.id, userId: ids.get(r)! })));
        for (const [i, input] of demo.schemes.entries()) {
          const scheme = await insertScheme(tx, { projectId: project!.id, document: schemeDocumentSchema.parse(input), authorId: ids.get("designer")!, note: "created" });
          if (demo.shared[i]) await tx.update(schema.schemes).set({ sharedWithClient: true, status: "proposed" }).where(eq(schema.schemes.id, scheme.id));
        }
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
