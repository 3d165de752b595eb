/**
 * Reading and writing a scheme's document as rows. No session checks here: callers
 * (db/queries/schemes.ts, the seed) decide who may; this module only keeps the rows right.
 */
import { asc, and, eq, notInArray, sql } from "drizzle-orm";
import type { NodePgQueryResultHKT } from "drizzle-orm/node-postgres";
import type { PgDatabase } from "drizzle-orm/pg-core";
import { dispositionOf } from "../lib/estimate/scheme";
import { schemeDocumentSchema, type DocDivision, type DocStop, type SchemeDocument } from "../lib/spec/document";
import { assignPositions } from "../lib/spec/ordering";
import * as schema from "./schema";
import { divisions, schemeRevisions, schemes, stops, type DivisionRow, type Scheme, type StopRow } from "./schema";

/** The database or a transaction on it. */
export type Store = PgDatabase<NodePgQueryResultHKT, typeof schema>;

type Accessories = SchemeDocument["accessories"];
const emptyAccessories = schemeDocumentSchema.shape.accessories.parse(undefined) as Accessories;

/** The organ's work beyond its divisions, kept together in one column. */
export function worksOf(doc: SchemeDocument) {
  return { case: doc.case, wind: doc.wind, site: doc.site };
}

// ── rows ↔ document ──────────────────────────────────────────────────────────────────────────

function stopFromRow(r: StopRow): DocStop {
  return { ...(r.props as Omit<DocStop, "id" | "name">), id: r.id, name: r.name };
}

function divisionFromRow(r: DivisionRow, divisionStops: DocStop[]): DocDivision {
  return { ...(r.props as Omit<DocDivision, "id" | "name" | "stops">), id: r.id, name: r.name, stops: divisionStops };
}

export async function loadDocument(tx: Store, scheme: Scheme): Promise<SchemeDocument> {
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
  const works = (scheme.works ?? {}) as Partial<Pick<SchemeDocument, "case" | "wind" | "site">>;
  const raw = {
    name: scheme.name,
    description: scheme.description,
    divisions: divRows.map((d) => divisionFromRow(d, byDivision.get(d.id) ?? [])),
    accessories: { ...emptyAccessories, ...(scheme.accessories as Partial<Accessories>) },
    ...works,
  };
  // Read through the scheme model: stops saved in an earlier format are upgraded, new fields take their defaults.
  const parsed = schemeDocumentSchema.safeParse(raw);
  return parsed.success ? parsed.data : (raw as SchemeDocument);
}

/** Replaces the scheme's divisions and stops with the document's, rewriting only moved rows' positions. */
export async function writeDocument(tx: Store, schemeId: string, doc: SchemeDocument) {
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
    return d.stops.map(({ id, name, ...props }) => ({ schemeId, id, name, divisionId: d.id, position: positions.get(id)!, treatment: dispositionOf(props), props }));
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

/** A new scheme with its document and its first revision, in the caller's transaction. */
export async function insertScheme(
  tx: Store,
  v: { projectId: string; document: SchemeDocument; authorId: string | null; copiedFromId?: string | null; note: string },
): Promise<Scheme> {
  const [scheme] = await tx
    .insert(schemes)
    .values({
      projectId: v.projectId,
      name: v.document.name,
      description: v.document.description,
      accessories: v.document.accessories,
      works: worksOf(v.document),
      copiedFromId: v.copiedFromId ?? null,
      updatedById: v.authorId,
    })
    .returning();
  await writeDocument(tx, scheme!.id, v.document);
  await tx.insert(schemeRevisions).values({ schemeId: scheme!.id, version: 1, document: v.document, note: v.note, authorId: v.authorId });
  return scheme!;
}
