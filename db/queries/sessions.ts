import "server-only";
import { and, eq, isNull, lt, or, sql } from "drizzle-orm";
import { db } from "@/db/client";
import type { Store } from "@/db/scheme-store";
import { authSessions, users } from "@/db/schema";
import type { Role } from "@/lib/roles";

/** How long a sign-in lasts, whatever happens in between: a working day and a half (hours). */
export const SESSION_HOURS = 12;

export type LiveSession = { user: { id: string; email: string; name: string; role: Role }; expiresAt: Date };

/** A new session row for a user who just signed in; old rows of theirs that ended are cleared. */
export async function createAuthSession({ userId }: { userId: string }): Promise<string> {
  const expiresAt = new Date(Date.now() + SESSION_HOURS * 3600_000);
  const [row] = await db.insert(authSessions).values({ userId, expiresAt }).returning({ id: authSessions.id });
  await db.delete(authSessions).where(and(eq(authSessions.userId, userId), or(lt(authSessions.expiresAt, sql`now()`), lt(authSessions.revokedAt, sql`now() - interval '1 day'`))));
  return row!.id;
}

// Prepared once: this runs on every signed-in request, so neither Drizzle nor PostgreSQL plans it again.
const liveSessionQuery = db
  .select({ id: users.id, email: users.email, name: users.name, role: users.role, expiresAt: authSessions.expiresAt })
  .from(authSessions)
  .innerJoin(users, eq(users.id, authSessions.userId))
  .where(and(eq(authSessions.id, sql.placeholder("sessionId")), isNull(authSessions.revokedAt), sql`${authSessions.expiresAt} > now()`, eq(users.disabled, false)))
  .limit(1)
  .prepare("live_session");

/**
 * The session's user as the database knows them now, or null when the session was revoked, has
 * expired, or its account is disabled. One query, run on every request that needs a user.
 */
export async function getLiveSession({ sessionId }: { sessionId: string }): Promise<LiveSession | null> {
  const [row] = await liveSessionQuery.execute({ sessionId });
  if (!row) return null;
  const { expiresAt, ...user } = row;
  return { user, expiresAt };
}

export async function revokeAuthSession({ sessionId }: { sessionId: string }): Promise<void> {
  await db.update(authSessions).set({ revokedAt: sql`now()` }).where(and(eq(authSessions.id, sessionId), isNull(authSessions.revokedAt)));
}

/** Ends every session of a user (disabled, or given another role), in the caller's transaction. */
export async function revokeSessionsOfUser({ userId, tx = db }: { userId: string; tx?: Store }): Promise<void> {
  await tx.update(authSessions).set({ revokedAt: sql`now()` }).where(and(eq(authSessions.userId, userId), isNull(authSessions.revokedAt)));
}
