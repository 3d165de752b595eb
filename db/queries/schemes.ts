import "server-only";
import { and, asc, desc, eq, notInArray, sql } from "drizzle-orm";
import { db, type Tx } from "@/db/client";
import { divisions, schemeRevisions, schemes, stops, users, type DivisionRow, type Project, type Scheme, type StopRow } from "@/db/schema";
import { AppError } from "@/lib/server/errors";
import type { SessionUser } from "@/lib/server/guard";
import { schemeDocumentSchema, type DocDivision, type DocStop, type SchemeDocument, type SchemeRead, type SchemeStatus } from "@/lib/spec/document";
import { assignPositions } from "@/lib/spec/ordering";
import { checkDocument } from "@/lib/spec/validate";
import { loadProjectFor, loadSchemeFor } from "./access";

type Accessories = SchemeDocument["accessories"];
const emptyAccessories = schemeDocumentSchema.shape.accessories.parse(undefined) as Accessories;

// ── rows ↔ document ──────────────────────────────────────────────────────────────────────────

function stopFromRow(r: StopRow): DocStop {
  return { ...(r.props as Omit<DocStop, "id" | "name">), id: r.id, name: r.name };
}

function divisionFromRow(r: DivisionRow, divisionStops: DocStop[]): DocDivision {
  return { ...(r.props as Omit<DocDivision, "id" | "name" | "stops">), id: r.id, name: r.name, stops: divisionStops };
}

async function loadDocument(tx: Tx | typeof db, scheme: Scheme): Promise<SchemeDocument> {
  const [divRows, stopRows] = await Promise.all([
    tx.select().from(divisions).where(eq(divisions.schemeId, scheme.id)).orderBy(asc(divisions.position)),
    tx.select().from(stops).where(eq(stops.schemeId, scheme.id)).orderBy(asc(stops.position)),
  ]);
  const byDivision = new Map<string, DocStop[]>();
  for (const s of stopRows) {
    const list = byDivision.get(s.divisionId) ?? [];
    list.push(stopFromRow(s));
    byDivision.set(s.divisionId, list);
  }
  return {
    name: scheme.name,
    description: scheme.description,
    divisions: divRows.map((d) => divisionFromRow(d, byDivision.get(d.id) ?? [])),
    accessories: { ...emptyAccessories, ...(scheme.accessories as Partial<Accessories>) },
  };
}

async function toRead(tx: Tx | typeof db, scheme: Scheme, project: Project): Promise<SchemeRead> {
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

/** Replaces the scheme's divisions and stops with the document's, rewriting only moved rows' positions. */
async function writeDocument(tx: Tx, schemeId: string, doc: SchemeDocument) {
  const [oldDivs, oldStops] = await Promise.all([
    tx.select({ id: divisions.id, position: divisions.position }).from(divisions).where(eq(divisions.schemeId, schemeId)),
    tx.select({ id: stops.id, divisionId: stops.divisionId, position: stops.position }).from(stops).where(eq(stops.schemeId, schemeId)),
  ]);
  const divIds = doc.divisions.map((d) => d.id);
  const stopIds = doc.divisions.flatMap((d) => d.stops.map((s) => s.id));

  // Stops first: they hang on divisions.
  await tx.delete(stops).where(stopIds.length ? and(eq(stops.schemeId, schemeId), notInArray(stops.id, stopIds)) : eq(stops.schemeId, schemeId));
  await tx.delete(divisions).where(divIds.length ? and(eq(divisions.schemeId, schemeId), notInArray(divisions.id, divIds)) : eq(divisions.schemeId, schemeId));
  if (!divIds.length) return;

  const divPositions = assignPositions(divIds, new Map(oldDivs.map((d) => [d.id, d.position])));
  await tx
    .insert(divisions)
    .values(doc.divisions.map(({ id, name, stops: _stops, ...props }) => ({ schemeId, id, name, position: divPositions.get(id)!, props })))
    .onConflictDoUpdate({ target: [divisions.schemeId, divisions.id], set: replaceWithOffered(["position", "name", "props"]) });

  if (!stopIds.length) return;
  const rows = doc.divisions.flatMap((d) => {
    // A stop keeps its key only while it stays in the same division.
    const previous = new Map(oldStops.filter((s) => s.divisionId === d.id).map((s) => [s.id, s.position]));
    const positions = assignPositions(d.stops.map((s) => s.id), previous);
    return d.stops.map(({ id, name, ...props }) => ({ schemeId, id, name, divisionId: d.id, position: positions.get(id)!, treatment: props.treatment, props }));
  });
  await tx
    .insert(stops)
    .values(rows)
    .onConflictDoUpdate({ target: [stops.schemeId, stops.id], set: replaceWithOffered(["division_id", "position", "name", "treatment", "props"]) });
}

/** `set col = excluded.col`: an upsert that replaces the row with the one offered. */
function replaceWithOffered(columns: string[]) {
  return Object.fromEntries(columns.map((c) => [c.replace(/_([a-z])/g, (_, ch: string) => ch.toUpperCase()), sql.raw(`excluded.${c}`)]));
}

function validated(raw: unknown): SchemeDocument {
  const check = checkDocument(raw, [], "document.");
  if (!check.ok) throw new AppError("invalid", "The scheme has problems; nothing was saved.", check.fields);
  return check.document;
}

// ── public queries ───────────────────────────────────────────────────────────────────────────

export async function getSchemeForUser({ user, schemeId }: { user: SessionUser; schemeId: string }): Promise<SchemeRead> {
  const { scheme, project } = await loadSchemeFor({ user, schemeId });
  return toRead(db, scheme, project);
}

export async function createScheme({ user, projectId, name, description = "", document }: { user: SessionUser; projectId: string; name: string; description?: string; document?: unknown }): Promise<SchemeRead> {
  const project = await loadProjectFor({ user, projectId });
  const doc = validated(document ?? { name, description, divisions: [] });
  return db.transaction(async (tx) => {
    const [scheme] = await tx
      .insert(schemes)
      .values({ projectId, name, description, accessories: doc.accessories, updatedById: user.id })
      .returning();
    await writeDocument(tx, scheme!.id, { ...doc, name, description });
    const read = await toRead(tx, scheme!, project);
    await tx.insert(schemeRevisions).values({ schemeId: scheme!.id, version: 1, document: read.document, note: "created", authorId: user.id });
    return read;
  });
}

export async function duplicateScheme({ user, schemeId, name }: { user: SessionUser; schemeId: string; name: string }): Promise<SchemeRead> {
  const { scheme, project } = await loadSchemeFor({ user, schemeId });
  const source = await loadDocument(db, scheme);
  return db.transaction(async (tx) => {
    const [copy] = await tx
      .insert(schemes)
      .values({ projectId: project.id, name, description: scheme.description, accessories: source.accessories, copiedFromId: scheme.id, updatedById: user.id })
      .returning();
    await writeDocument(tx, copy!.id, { ...source, name });
    const read = await toRead(tx, copy!, project);
    await tx.insert(schemeRevisions).values({ schemeId: copy!.id, version: 1, document: read.document, note: `copied from "${scheme.name}"`, authorId: user.id });
    return read;
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
      .set({ name: doc.name, description: doc.description, accessories: doc.accessories, version: scheme.version + 1, updatedById: user.id, updatedAt: new Date() })
      .where(eq(schemes.id, schemeId))
      .returning();
    const read = await toRead(tx, updated!, project);
    await tx.insert(schemeRevisions).values({ schemeId, version: updated!.version, document: read.document, note, authorId: user.id });
    return read;
  });
}

export async function updateSchemeMeta({ user, schemeId, status, sharedWithClient }: { user: SessionUser; schemeId: string; status?: SchemeStatus; sharedWithClient?: boolean }): Promise<SchemeRead> {
  const { project } = await loadSchemeFor({ user, schemeId });
  const [updated] = await db
    .update(schemes)
    .set({ ...(status ? { status } : {}), ...(sharedWithClient !== undefined ? { sharedWithClient } : {}), updatedAt: new Date() })
    .where(eq(schemes.id, schemeId))
    .returning();
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
