import "server-only";
import { and, eq, sql } from "drizzle-orm";
import type { SelectedFields } from "drizzle-orm/pg-core";
import { db } from "@/db/client";
import type { Store } from "@/db/scheme-store";
import { projectMembers, projects, schemes, users, type Project, type Scheme } from "@/db/schema";
import { AppError } from "@/lib/server/errors";
import type { SessionUser } from "@/lib/server/guard";

/**
 * Who may see what: the firm's people see every project of the firm; a client sees only projects
 * they are a member of, and in them only the schemes shared with the committee. Anything else
 * answers 404, so a client cannot learn that a project exists.
 */
export async function loadProjectFor({ user, projectId, tx = db }: { user: SessionUser; projectId: string; tx?: Store }): Promise<Project> {
  if (!isUuid(projectId)) throw new AppError("not_found", "No such project.");
  const [project] = await tx.select().from(projects).where(eq(projects.id, projectId)).limit(1);
  if (!project) throw new AppError("not_found", "No such project.");
  if (user.role === "client") {
    const [member] = await tx
      .select({ userId: projectMembers.userId })
      .from(projectMembers)
      .where(and(eq(projectMembers.projectId, projectId), eq(projectMembers.userId, user.id)))
      .limit(1);
    if (!member) throw new AppError("not_found", "No such project.");
  }
  return project;
}

export async function loadSchemeFor({ user, schemeId, tx = db, lock = false }: { user: SessionUser; schemeId: string; tx?: Store; lock?: boolean }): Promise<{ scheme: Scheme; project: Project }> {
  if (!isUuid(schemeId)) throw new AppError("not_found", "No such scheme.");
  const query = tx.select().from(schemes).where(eq(schemes.id, schemeId)).limit(1);
  const [scheme] = lock ? await query.for("update") : await query;
  if (!scheme) throw new AppError("not_found", "No such scheme.");
  // A scheme of someone else's project answers exactly as one that does not exist.
  const project = await loadProjectFor({ user, projectId: scheme.projectId, tx }).catch((err: unknown) => {
    throw err instanceof AppError && err.code === "not_found" ? new AppError("not_found", "No such scheme.") : err;
  });
  if (user.role === "client" && !scheme.sharedWithClient) throw new AppError("not_found", "No such scheme.");
  return { scheme, project };
}

/** A scheme's row with what a read needs of its project and author, without its document. */
export type SchemeHead = Pick<Scheme, "id" | "projectId" | "name" | "description" | "status" | "sharedWithClient" | "version" | "copiedFromId" | "updatedAt"> & {
  updatedByName: string | null;
  pitchHz: number;
  temperatureC: number;
};

/**
 * The same rule as loadSchemeFor, in one query, for the reads that run most often (the editor's
 * scheme and its estimate): the scheme, its project's tuning and its author's name, and for a
 * client whether they are a member of the project.
 */
// Prepared once (it runs on every scheme and estimate read); the membership test is cheap and only
// consulted for clients.
const schemeHeadColumns = {
  id: schemes.id,
  projectId: schemes.projectId,
  name: schemes.name,
  description: schemes.description,
  status: schemes.status,
  sharedWithClient: schemes.sharedWithClient,
  version: schemes.version,
  copiedFromId: schemes.copiedFromId,
  updatedAt: schemes.updatedAt,
  updatedByName: users.name,
  pitchHz: projects.pitchHz,
  temperatureC: projects.temperatureC,
  member: sql<boolean>`exists (select 1 from ${projectMembers} where ${projectMembers.projectId} = ${projects.id} and ${projectMembers.userId} = ${sql.placeholder("userId")})`,
};
/** The scheme-head query, with columns of its own beside the head's (the estimate adds its rate-set version). */
export function prepareSchemeHead<E extends SelectedFields>(name: string, extra: E) {
  return db
    .select({ ...schemeHeadColumns, ...extra })
    .from(schemes)
    .innerJoin(projects, eq(projects.id, schemes.projectId))
    .leftJoin(users, eq(users.id, schemes.updatedById))
    .where(eq(schemes.id, sql.placeholder("schemeId")))
    .limit(1)
    .prepare(name);
}
const schemeHeadQuery = prepareSchemeHead("scheme_head", {});
/** The head of a scheme this user may see (a client: only shared schemes of their projects), or 404. */
export function admitSchemeHead<R extends { member: boolean; sharedWithClient: boolean }>(user: SessionUser, row: R | undefined): Omit<R, "member"> {
  if (!row || (user.role === "client" && !(row.member && row.sharedWithClient))) throw new AppError("not_found", "No such scheme.");
  const { member: _member, ...head } = row;
  return head;
}

export async function loadSchemeHeadFor({ user, schemeId }: { user: SessionUser; schemeId: string }): Promise<SchemeHead> {
  if (!isUuid(schemeId)) throw new AppError("not_found", "No such scheme.");
  const [row] = await schemeHeadQuery.execute({ schemeId, userId: user.id });
  return admitSchemeHead(user, row);
}

/**
 * An archived project is a record: it and its schemes are read, not changed, until it is brought
 * back. (Removing a member stays possible, so access can always be taken away.)
 */
export function assertOpen(project: Project, toDo = "change its schemes"): void {
  if (project.archivedAt) throw new AppError("conflict", `This project is archived; bring it back from the archive to ${toDo}.`);
}

export function isUuid(value: string): boolean {
  return /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i.test(value);
}
