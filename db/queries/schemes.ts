import "server-only";
import { and, desc, eq } from "drizzle-orm";
import { db } from "@/db/client";
import { schemeRevisions, schemes, users, type Project, type Scheme } from "@/db/schema";
import { insertScheme, loadDocument, worksOf, writeDocument, type Store } from "@/db/scheme-store";
import { AppError } from "@/lib/server/errors";
import type { SessionUser } from "@/lib/server/guard";
import { schemeDocumentSchema, type SchemeDocument, type SchemeRead, type SchemeStatus } from "@/lib/spec/document";
import { checkDocument } from "@/lib/spec/validate";
import { sendSchemeShared } from "@/lib/server/notify";
import { readCache } from "@/lib/server/read-cache";
import { assertOpen, loadProjectFor, loadSchemeFor, loadSchemeHeadFor } from "./access";

async function toRead(tx: Store, scheme: Scheme, project: Project): Promise<SchemeRead> {
  const [document, author] = await Promise.all([
    loadDocument(tx, scheme),
    scheme.updatedById ? tx.select({ name: users.name }).from(users).where(eq(users.id, scheme.updatedById)).limit(1) : Promise.resolve([]),
  ]);
  return {
    id: scheme.id,
    projectId: scheme.projectId,
    name: scheme.name,
    description: scheme.description,
    status: scheme.status,
    sharedWithClient: scheme.sharedWithClient,
    version: scheme.version,
    copiedFromId: scheme.copiedFromId,
    updatedAt: scheme.updatedAt.toISOString(),
    updatedByName: author[0]?.name ?? null,
    tuning: { pitchHz: project.pitchHz, temperatureC: project.temperatureC },
    document,
  };
}

function validated(raw: unknown): SchemeDocument {
  const check = checkDocument(raw, "document.");
  if (!check.ok) throw new AppError("invalid", "The scheme has problems; nothing was saved.", check.fields);
  return check.document;
}

// ── public queries ───────────────────────────────────────────────────────────────────────────

// One snapshot for the scheme row and its divisions and stops, so a save landing between the
// queries cannot give a half-old, half-new document.
const snapshot = { isolationLevel: "repeatable read", accessMode: "read only" } as const;

/** A committee member is not told which (perhaps unshared) scheme this one was copied from. */
function viewFor<T extends { copiedFromId: string | null }>(user: SessionUser, read: T): T {
  return user.role === "client" ? { ...read, copiedFromId: null } : read;
}

/**
 * GET /api/schemes/:id as JSON text. One query checks access and reads the scheme's row and
 * version; the document's JSON for that version comes from the read cache, or on a miss from one
 * consistent snapshot of its rows, which then fills the cache.
 */
export async function getSchemeJsonForUser({ user, schemeId }: { user: SessionUser; schemeId: string }): Promise<string> {
  const head = viewFor(user, await loadSchemeHeadFor({ user, schemeId }));
  const documentJson = readCache.documents.get(`${head.id}:${head.version}`);
  if (documentJson === undefined) {
    const read = await db.transaction(async (tx) => {
      const { scheme, project } = await loadSchemeFor({ user, schemeId, tx });
      return toRead(tx, scheme, project);
    }, snapshot);
    readCache.documents.set(`${read.id}:${read.version}`, JSON.stringify(read.document));
    return JSON.stringify({ scheme: viewFor(user, read) });
  }
  const { pitchHz, temperatureC, ...row } = head;
  const meta: Omit<SchemeRead, "document"> = {
    id: row.id,
    projectId: row.projectId,
    name: row.name,
    description: row.description,
    status: row.status,
    sharedWithClient: row.sharedWithClient,
    version: row.version,
    copiedFromId: row.copiedFromId,
    updatedAt: row.updatedAt.toISOString(),
    updatedByName: row.updatedByName,
    tuning: { pitchHz, temperatureC },
  };
  return `{"scheme":${JSON.stringify(meta).slice(0, -1)},"document":${documentJson}}}`;
}

export async function getSchemeForUser({ user, schemeId }: { user: SessionUser; schemeId: string }): Promise<SchemeRead> {
  return (JSON.parse(await getSchemeJsonForUser({ user, schemeId })) as { scheme: SchemeRead }).scheme;
}

export async function createScheme({ user, projectId, name, description = "", document }: { user: SessionUser; projectId: string; name: string; description?: string; document?: unknown }): Promise<SchemeRead> {
  const project = await loadProjectFor({ user, projectId });
  assertOpen(project);
  const doc = validated({ ...((document as object | undefined) ?? { divisions: [] }), name, description });
  return db.transaction(async (tx) => toRead(tx, await insertScheme(tx, { projectId, document: doc, authorId: user.id, note: "created" }), project));
}

export async function duplicateScheme({ user, schemeId, name }: { user: SessionUser; schemeId: string; name: string }): Promise<SchemeRead> {
  return db.transaction(async (tx) => {
    const { scheme, project } = await loadSchemeFor({ user, schemeId, tx });
    assertOpen(project);
    const source = await loadDocument(tx, scheme);
    const copy = await insertScheme(tx, { projectId: project.id, document: { ...source, name }, authorId: user.id, copiedFromId: scheme.id, note: `copied from "${scheme.name}"` });
    return toRead(tx, copy, project);
  });
}

/**
 * Saves a whole document against the version it was based on. A stale version gets 409 with the
 * current scheme, and nothing is written; every save keeps a revision.
 */
export async function saveScheme({ user, schemeId, version, document, note = "" }: { user: SessionUser; schemeId: string; version: number; document: unknown; note?: string }): Promise<SchemeRead> {
  const doc = validated(document);
  return db.transaction(async (tx) => {
    const { scheme, project } = await loadSchemeFor({ user, schemeId, tx, lock: true });
    assertOpen(project);
    if (scheme.version !== version) {
      const current = await toRead(tx, scheme, project);
      throw new AppError(
        "conflict",
        `${current.updatedByName ?? "Someone"} saved version ${scheme.version} after the version ${version} you started from.`,
        undefined,
        { current },
      );
    }
    await writeDocument(tx, schemeId, doc);
    const [updated] = await tx
      .update(schemes)
      .set({ name: doc.name, description: doc.description, accessories: doc.accessories, works: worksOf(doc), version: scheme.version + 1, updatedById: user.id, updatedAt: new Date() })
      .where(eq(schemes.id, schemeId))
      .returning();
    const read = await toRead(tx, updated!, project);
    await tx.insert(schemeRevisions).values({ schemeId, version: updated!.version, document: read.document, note, authorId: user.id });
    return read;
  });
}

export async function updateSchemeMeta({ user, schemeId, status, sharedWithClient }: { user: SessionUser; schemeId: string; status?: SchemeStatus; sharedWithClient?: boolean }): Promise<SchemeRead> {
  const { scheme, project } = await loadSchemeFor({ user, schemeId });
  assertOpen(project, "share its schemes or change their status");
  const [updated] = await db
    .update(schemes)
    .set({ ...(status ? { status } : {}), ...(sharedWithClient !== undefined ? { sharedWithClient } : {}), updatedAt: new Date() })
    .where(eq(schemes.id, schemeId))
    .returning();
  // The committee hears of a scheme when it is first opened to them.
  if (sharedWithClient && !scheme.sharedWithClient) await sendSchemeShared({ project, schemeId, schemeName: updated!.name, sharedBy: user.name });
  return toRead(db, updated!, project);
}

export async function listRevisions({ user, schemeId }: { user: SessionUser; schemeId: string }) {
  await loadSchemeFor({ user, schemeId });
  const rows = await db
    .select({ version: schemeRevisions.version, note: schemeRevisions.note, createdAt: schemeRevisions.createdAt, authorName: users.name })
    .from(schemeRevisions)
    .leftJoin(users, eq(users.id, schemeRevisions.authorId))
    .where(eq(schemeRevisions.schemeId, schemeId))
    .orderBy(desc(schemeRevisions.version));
  return rows.map((r) => ({ ...r, authorName: r.authorName ?? null, createdAt: r.createdAt.toISOString() }));
}

export async function getRevision({ user, schemeId, version }: { user: SessionUser; schemeId: string; version: number }) {
  await loadSchemeFor({ user, schemeId });
  const [row] = await db
    .select({ version: schemeRevisions.version, note: schemeRevisions.note, createdAt: schemeRevisions.createdAt, authorName: users.name, document: schemeRevisions.document })
    .from(schemeRevisions)
    .leftJoin(users, eq(users.id, schemeRevisions.authorId))
    .where(and(eq(schemeRevisions.schemeId, schemeId), eq(schemeRevisions.version, version)))
    .limit(1);
  if (!row) throw new AppError("not_found", `This scheme has no version ${version}.`);
  return { ...row, authorName: row.authorName ?? null, createdAt: row.createdAt.toISOString(), document: schemeDocumentSchema.parse(row.document) };
}

/** Restoring writes the old document as a new version, so the restore itself can be undone. */
export async function restoreRevision({ user, schemeId, version, basedOn }: { user: SessionUser; schemeId: string; version: number; basedOn: number }) {
  const revision = await getRevision({ user, schemeId, version });
  return saveScheme({ user, schemeId, version: basedOn, document: revision.document, note: `restored version ${version}` });
}
