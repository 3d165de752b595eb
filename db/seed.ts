// Seeds the invented demo scenario. Idempotent: a second run changes nothing.
import bcrypt from "bcryptjs";
import { drizzle } from "drizzle-orm/node-postgres";
import { and, eq } from "drizzle-orm";
import { Pool } from "pg";
import { env } from "../lib/env";
import { schemeDocumentSchema } from "../lib/spec/document";
import { demoAccounts, demoFirm } from "./demo-accounts";
import { demoProjects, restoreScheme } from "./demo-scenario";
import { insertScheme, type Store } from "./scheme-store";
import { parishSurveyFiles } from "./demo-files";
import { inspectFile } from "../lib/server/file-check";
import { fileKeys, writeObject } from "../lib/server/storage";
import { storageSettings } from "../lib/env";
import { acceptedTypes } from "../lib/files/kinds";
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
      await seedSurveyFiles(tx, demoProjects[0]!.project.name, ids.get("workshop")!);
    });
    console.log("demo data in place");
  } finally {
    await pool.end();
  }
}

/**
 * The parish's survey files, stored the way an upload is (checked by content, thumbnail made, the
 * server's own keys), once: a project that already has files is left alone.
 */
async function seedSurveyFiles(tx: Store, projectName: string, uploaderId: string) {
  const [project] = await tx.select({ id: schema.projects.id }).from(schema.projects).where(eq(schema.projects.name, projectName)).limit(1);
  if (!project) return;
  const [any] = await tx.select({ id: schema.projectFiles.id }).from(schema.projectFiles).where(eq(schema.projectFiles.projectId, project.id)).limit(1);
  if (any) return;
  const [schemeA] = await tx
    .select({ id: schema.schemes.id })
    .from(schema.schemes)
    .where(and(eq(schema.schemes.projectId, project.id), eq(schema.schemes.name, restoreScheme.name)))
    .limit(1);
  const { maxBytes } = storageSettings();
  for (const f of parishSurveyFiles) {
    const bytes = await f.bytes();
    const checked = await inspectFile(f.name, bytes, maxBytes);
    if (!checked.ok) throw new Error(`demo file ${f.name}: ${checked.message}`);
    const id = crypto.randomUUID();
    const objectKey = fileKeys.originalKey(project.id, id, acceptedTypes[checked.type].extensions[0]);
    await writeObject(objectKey, bytes, checked.type);
    const thumbnailKey = checked.thumbnail ? fileKeys.thumbnailKey(project.id, id) : null;
    if (thumbnailKey) await writeObject(thumbnailKey, checked.thumbnail!, "image/jpeg");
    await tx.insert(schema.projectFiles).values({
      id,
      projectId: project.id,
      status: "ready",
      uploadKey: fileKeys.uploadKey(project.id, id),
      objectKey,
      thumbnailKey,
      originalName: f.name,
      contentType: checked.type,
      category: f.category,
      sizeBytes: bytes.length,
      width: checked.width,
      height: checked.height,
      caption: f.caption,
      schemeId: f.link && schemeA ? schemeA.id : null,
      divisionId: f.link?.divisionId ?? null,
      stopId: f.link?.stopId ?? null,
      sharedWithClient: !!f.shared,
      uploadedById: uploaderId,
      completedAt: new Date(),
    });
  }
}

main().catch((err) => {
  console.error(`seeding failed: ${err instanceof Error ? err.message : String(err)}`);
  process.exit(1);
});
