import "server-only";
import { and, asc, eq } from "drizzle-orm";
import { db } from "@/db/client";
import { projectMembers, schemePreferences, schemes, users } from "@/db/schema";
import { AppError } from "@/lib/server/errors";
import type { SessionUser } from "@/lib/server/guard";
import type { PreferenceRead, PreferenceSummary } from "@/lib/spec/committee";
import { loadProjectFor, loadSchemeFor } from "./access";

/** A committee member's own preference in a project, or null. Only shared schemes count. */
export async function getOwnPreference({ user, projectId }: { user: SessionUser; projectId: string }): Promise<PreferenceRead | null> {
  await loadProjectFor({ user, projectId });
  const [row] = await db
    .select({ schemeId: schemePreferences.schemeId, schemeName: schemes.name, note: schemePreferences.note, updatedAt: schemePreferences.updatedAt })
    .from(schemePreferences)
    .innerJoin(schemes, eq(schemes.id, schemePreferences.schemeId))
    .where(and(eq(schemePreferences.projectId, projectId), eq(schemePreferences.userId, user.id), eq(schemes.sharedWithClient, true)))
    .limit(1);
  return row ? { ...row, updatedAt: row.updatedAt.toISOString() } : null;
}

/** Records (or changes) the member's one preferred scheme; the scheme must be shared with them in this project. */
export async function recordPreference({ user, projectId, schemeId, note }: { user: SessionUser; projectId: string; schemeId: string; note: string }): Promise<PreferenceRead> {
  if (user.role !== "client") throw new AppError("forbidden", "Only committee members record a preference.");
  await loadProjectFor({ user, projectId });
  const { scheme } = await loadSchemeFor({ user, schemeId });
  if (scheme.projectId !== projectId) throw new AppError("not_found", "No such scheme.");
  const now = new Date();
  await db
    .insert(schemePreferences)
    .values({ projectId, userId: user.id, schemeId, note, updatedAt: now })
    .onConflictDoUpdate({ target: [schemePreferences.projectId, schemePreferences.userId], set: { schemeId, note, updatedAt: now } });
  return { schemeId, schemeName: scheme.name, note, updatedAt: now.toISOString() };
}

export async function clearPreference({ user, projectId }: { user: SessionUser; projectId: string }): Promise<void> {
  await loadProjectFor({ user, projectId });
  await db.delete(schemePreferences).where(and(eq(schemePreferences.projectId, projectId), eq(schemePreferences.userId, user.id)));
}

/** For the firm: every committee member with their preference, and the count per shared scheme. */
export async function summarisePreferences({ user, projectId }: { user: SessionUser; projectId: string }): Promise<PreferenceSummary> {
  if (user.role === "client") throw new AppError("not_found", "No such project.");
  await loadProjectFor({ user, projectId });
  const members = await db
    .select({ userId: users.id, name: users.name })
    .from(projectMembers)
    .innerJoin(users, eq(users.id, projectMembers.userId))
    .where(and(eq(projectMembers.projectId, projectId), eq(users.role, "client")))
    .orderBy(asc(users.name));
  const prefs = await db
    .select({ userId: schemePreferences.userId, schemeId: schemePreferences.schemeId, schemeName: schemes.name, note: schemePreferences.note, updatedAt: schemePreferences.updatedAt })
    .from(schemePreferences)
    .innerJoin(schemes, eq(schemes.id, schemePreferences.schemeId))
    .where(and(eq(schemePreferences.projectId, projectId), eq(schemes.sharedWithClient, true)));
  const shared = await db.select({ id: schemes.id, name: schemes.name }).from(schemes).where(and(eq(schemes.projectId, projectId), eq(schemes.sharedWithClient, true))).orderBy(asc(schemes.createdAt));
  const byUser = new Map(prefs.map((p) => [p.userId, p]));
  return {
    members: members.map((m) => {
      const p = byUser.get(m.userId);
      return { userId: m.userId, name: m.name, preference: p ? { schemeId: p.schemeId, schemeName: p.schemeName, note: p.note, updatedAt: p.updatedAt.toISOString() } : null };
    }),
    schemes: shared.map((s) => ({ schemeId: s.id, schemeName: s.name, count: members.filter((m) => byUser.get(m.userId)?.schemeId === s.id).length })),
  };
}
