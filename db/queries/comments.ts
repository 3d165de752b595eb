import "server-only";
import { and, asc, eq } from "drizzle-orm";
import { db } from "@/db/client";
import { divisions, schemeComments, schemeNotes, stops, users } from "@/db/schema";
import { stopTitle } from "@/components/spec/format";
import { AppError } from "@/lib/server/errors";
import type { SessionUser } from "@/lib/server/guard";
import { sendCommentNotice } from "@/lib/server/notify";
import type { CommentRead } from "@/lib/spec/committee";
import { isUuid, loadSchemeFor } from "./access";

/** Comments (read by the firm and the committee) and the firm's notes share a shape but never a table. */
type Thread = "comments" | "notes";
const tables = { comments: schemeComments, notes: schemeNotes } as const;

/** "Open Diapason 8′ (Great)" for a stop of the scheme as saved; 404 wording when it is not there. */
async function stopLabel(schemeId: string, stopId: string): Promise<string> {
  const [row] = await db
    .select({ name: stops.name, props: stops.props, divisionName: divisions.name })
    .from(stops)
    .innerJoin(divisions, and(eq(divisions.schemeId, stops.schemeId), eq(divisions.id, stops.divisionId)))
    .where(and(eq(stops.schemeId, schemeId), eq(stops.id, stopId)))
    .limit(1);
  if (!row) throw new AppError("invalid", "That stop is not in this scheme (it may have been removed); reload the page.", { stopId: ["That stop is not in this scheme."] });
  const props = row.props as { footage?: string | number; ranks?: number; family?: string };
  const title = props.footage !== undefined ? stopTitle({ name: row.name, footage: props.footage, ranks: props.ranks, family: props.family ?? "" }) : row.name;
  return `${title} (${row.divisionName})`;
}

async function listThread(thread: Thread, schemeId: string): Promise<CommentRead[]> {
  const t = tables[thread];
  const rows = await db
    .select({ c: t, authorName: users.name, authorRole: users.role })
    .from(t)
    .innerJoin(users, eq(users.id, t.authorId))
    .where(eq(t.schemeId, schemeId))
    .orderBy(asc(t.createdAt));
  return rows.map(({ c, authorName, authorRole }) => ({
    id: c.id,
    schemeId: c.schemeId,
    stopId: c.stopId,
    stopLabel: c.stopLabel,
    body: c.body,
    authorId: c.authorId,
    authorName,
    authorSide: authorRole === "client" ? "committee" : "firm",
    createdAt: c.createdAt.toISOString(),
  }));
}

export async function listComments({ user, schemeId }: { user: SessionUser; schemeId: string }): Promise<CommentRead[]> {
  await loadSchemeFor({ user, schemeId });
  return listThread("comments", schemeId);
}

/** The firm's notes: the route requires notes:read, which no client holds; checked here as well. */
export async function listNotes({ user, schemeId }: { user: SessionUser; schemeId: string }): Promise<CommentRead[]> {
  if (user.role === "client") throw new AppError("not_found", "No such scheme.");
  await loadSchemeFor({ user, schemeId });
  return listThread("notes", schemeId);
}

async function addTo(thread: Thread, { user, schemeId, body, stopId }: { user: SessionUser; schemeId: string; body: string; stopId: string | null }): Promise<CommentRead> {
  const { scheme, project } = await loadSchemeFor({ user, schemeId });
  const label = stopId ? await stopLabel(schemeId, stopId) : null;
  const t = tables[thread];
  const [row] = await db.insert(t).values({ schemeId, stopId, stopLabel: label, authorId: user.id, body }).returning();
  if (thread === "comments") {
    await sendCommentNotice({ project, schemeId, schemeName: scheme.name, author: user, stopLabel: label, text: body });
  }
  return {
    id: row!.id, schemeId, stopId, stopLabel: label, body, authorId: user.id, authorName: user.name,
    authorSide: user.role === "client" ? "committee" : "firm", createdAt: row!.createdAt.toISOString(),
  };
}

export function addComment(args: { user: SessionUser; schemeId: string; body: string; stopId: string | null }) {
  return addTo("comments", args);
}

export function addNote(args: { user: SessionUser; schemeId: string; body: string; stopId: string | null }) {
  if (args.user.role === "client") throw new AppError("not_found", "No such scheme.");
  return addTo("notes", args);
}

/** Authors may take back their own comment or note. */
export async function deleteEntry({ user, thread, id }: { user: SessionUser; thread: Thread; id: string }): Promise<{ schemeId: string }> {
  const what = thread === "comments" ? "comment" : "note";
  if (!isUuid(id)) throw new AppError("not_found", `No such ${what}.`);
  const t = tables[thread];
  const [row] = await db.select().from(t).where(eq(t.id, id)).limit(1);
  if (!row || (thread === "notes" && user.role === "client")) throw new AppError("not_found", `No such ${what}.`);
  await loadSchemeFor({ user, schemeId: row.schemeId });
  if (row.authorId !== user.id) throw new AppError("forbidden", `Only its author can delete a ${what}.`);
  await db.delete(t).where(eq(t.id, id));
  return { schemeId: row.schemeId };
}
