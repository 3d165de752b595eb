import "server-only";
import { and, asc, count, desc, eq, inArray, isNull } from "drizzle-orm";
import { db } from "@/db/client";
import { projectMembers, projects, schemes, stops, divisions, users, type Project } from "@/db/schema";
import { AppError } from "@/lib/server/errors";
import type { SessionUser } from "@/lib/server/guard";
import type { ProjectRead, ProjectSummary, SchemeSummary } from "@/lib/spec/projects";
import { projectInputSchema, type projectPatchSchema } from "@/lib/spec/projects";
import type { z } from "zod";
import { assertOpen, loadProjectFor } from "./access";

type ProjectInput = z.output<typeof projectInputSchema>;
type ProjectPatch = z.output<typeof projectPatchSchema>;

function summary(p: Project, schemeCount: number): ProjectSummary {
  return {
    id: p.id,
    name: p.name,
    clientName: p.clientName,
    venue: p.venue,
    location: p.location,
    instrument: p.instrument,
    status: p.status,
    targetDate: p.targetDate,
    archived: p.archivedAt !== null,
    schemeCount,
    updatedAt: p.updatedAt.toISOString(),
  };
}

export async function listProjectsForUser({ user, includeArchived = false }: { user: SessionUser; includeArchived?: boolean }): Promise<ProjectSummary[]> {
  const conditions = [];
  if (!includeArchived) conditions.push(isNull(projects.archivedAt));
  if (user.role === "client") {
    conditions.push(inArray(projects.id, db.select({ id: projectMembers.projectId }).from(projectMembers).where(eq(projectMembers.userId, user.id))));
  }
  const rows = await db
    .select()
    .from(projects)
    .where(conditions.length ? and(...conditions) : undefined)
    .orderBy(desc(projects.updatedAt));
  const counts = rows.length
    ? await db
        .select({ projectId: schemes.projectId, n: count() })
        .from(schemes)
        // Clients count only the schemes shared with them.
        .where(and(inArray(schemes.projectId, rows.map((p) => p.id)), user.role === "client" ? eq(schemes.sharedWithClient, true) : undefined))
        .groupBy(schemes.projectId)
    : [];
  const countBy = new Map(counts.map((c) => [c.projectId, c.n]));
  return rows.map((p) => summary(p, countBy.get(p.id) ?? 0));
}

async function membersOf(projectId: string) {
  return db
    .select({ id: users.id, name: users.name, email: users.email, role: users.role })
    .from(projectMembers)
    .innerJoin(users, eq(users.id, projectMembers.userId))
    .where(eq(projectMembers.projectId, projectId))
    .orderBy(asc(users.name));
}

async function readProject(p: Project, user: SessionUser): Promise<{ project: ProjectRead; schemes: SchemeSummary[] }> {
  const schemeRows = await db
    .select()
    .from(schemes)
    .where(user.role === "client" ? and(eq(schemes.projectId, p.id), eq(schemes.sharedWithClient, true)) : eq(schemes.projectId, p.id))
    .orderBy(asc(schemes.createdAt));
  const ids = schemeRows.map((s) => s.id);
  const stopCounts = ids.length
    ? await db.select({ schemeId: stops.schemeId, n: count() }).from(stops).where(inArray(stops.schemeId, ids)).groupBy(stops.schemeId)
    : [];
  const divisionCounts = ids.length
    ? await db.select({ schemeId: divisions.schemeId, n: count() }).from(divisions).where(inArray(divisions.schemeId, ids)).groupBy(divisions.schemeId)
    : [];
  const stopsBy = new Map(stopCounts.map((r) => [r.schemeId, r.n]));
  const divisionsBy = new Map(divisionCounts.map((r) => [r.schemeId, r.n]));
  // Committee members see who is on the project, but only their own e-mail address.
  const members = (await membersOf(p.id)).map((m) => (user.role === "client" && m.id !== user.id ? { ...m, email: "" } : m));
  return {
    project: { ...summary(p, schemeRows.length), pitchHz: p.pitchHz, temperatureC: p.temperatureC, notes: user.role === "client" ? "" : p.notes, members },
    schemes: schemeRows.map((s) => ({
      id: s.id,
      name: s.name,
      description: s.description,
      status: s.status,
      sharedWithClient: s.sharedWithClient,
      version: s.version,
      copiedFromId: user.role === "client" ? null : s.copiedFromId,
      updatedAt: s.updatedAt.toISOString(),
      stopCount: stopsBy.get(s.id) ?? 0,
      divisionCount: divisionsBy.get(s.id) ?? 0,
    })),
  };
}

export async function getProjectForUser({ user, projectId }: { user: SessionUser; projectId: string }) {
  return readProject(await loadProjectFor({ user, projectId }), user);
}

export async function createProject({ user, input }: { user: SessionUser; input: ProjectInput }) {
  const project = await db.transaction(async (tx) => {
    const [row] = await tx.insert(projects).values({ ...input, createdById: user.id }).returning();
    await tx.insert(projectMembers).values({ projectId: row!.id, userId: user.id });
    return row!;
  });
  return readProject(project, user);
}

export async function updateProject({ user, projectId, patch }: { user: SessionUser; projectId: string; patch: ProjectPatch }) {
  assertOpen(await loadProjectFor({ user, projectId }), "change its details");
  const [row] = await db.update(projects).set({ ...patch, updatedAt: new Date() }).where(eq(projects.id, projectId)).returning();
  return readProject(row!, user);
}

export async function setProjectStatus({ user, projectId, status }: { user: SessionUser; projectId: string; status: ProjectInput["status"] }) {
  assertOpen(await loadProjectFor({ user, projectId }), "change its status");
  const [row] = await db.update(projects).set({ status, updatedAt: new Date() }).where(eq(projects.id, projectId)).returning();
  return readProject(row!, user);
}

export async function setProjectArchived({ user, projectId, archived }: { user: SessionUser; projectId: string; archived: boolean }) {
  await loadProjectFor({ user, projectId });
  const [row] = await db
    .update(projects)
    .set({ archivedAt: archived ? new Date() : null, updatedAt: new Date() })
    .where(eq(projects.id, projectId))
    .returning();
  return readProject(row!, user);
}

export async function addProjectMember({ user, projectId, email }: { user: SessionUser; projectId: string; email: string }) {
  const project = await loadProjectFor({ user, projectId });
  assertOpen(project, "add members");
  const [member] = await db.select({ id: users.id, disabled: users.disabled }).from(users).where(eq(users.email, email.trim().toLowerCase())).limit(1);
  if (!member) {
    throw new AppError("invalid", `No user has the e-mail ${email}. An administrator can add them first.`, { email: [`No user has the e-mail ${email}.`] });
  }
  await db.insert(projectMembers).values({ projectId, userId: member.id }).onConflictDoNothing();
  return readProject(project, user);
}

export async function removeProjectMember({ user, projectId, userId }: { user: SessionUser; projectId: string; userId: string }) {
  const project = await loadProjectFor({ user, projectId });
  await db.delete(projectMembers).where(and(eq(projectMembers.projectId, projectId), eq(projectMembers.userId, userId)));
  return readProject(project, user);
}
