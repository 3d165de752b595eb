import "server-only";
import { and, desc, eq, gt, isNull } from "drizzle-orm";
import { db } from "@/db/client";
import { invitations, projectMembers, projects, schemePreferences, users, type Invitation, type Project } from "@/db/schema";
import { AppError } from "@/lib/server/errors";
import type { SessionUser } from "@/lib/server/guard";
import { sendAddedToProject, sendInvitation } from "@/lib/server/notify";
import { INVITATION_DAYS, invitationState, type InvitationState, type InvitationSummary } from "@/lib/spec/committee";
import { isUuid, loadProjectFor } from "./access";
import { hashPassword } from "./users";

import { hashToken, newToken } from "@/db/invitation-token";

const expiry = () => new Date(Date.now() + INVITATION_DAYS * 24 * 3600 * 1000);

function summary(inv: Invitation, invitedByName: string | null): InvitationSummary {
  return {
    id: inv.id,
    email: inv.email,
    name: inv.name,
    state: invitationState(inv),
    invitedByName,
    sentAt: inv.sentAt.toISOString(),
    expiresAt: inv.expiresAt.toISOString(),
    acceptedAt: inv.acceptedAt?.toISOString() ?? null,
  };
}

export async function listInvitations({ user, projectId }: { user: SessionUser; projectId: string }): Promise<InvitationSummary[]> {
  await loadProjectFor({ user, projectId });
  const rows = await db
    .select({ inv: invitations, invitedByName: users.name })
    .from(invitations)
    .leftJoin(users, eq(users.id, invitations.invitedById))
    .where(eq(invitations.projectId, projectId))
    .orderBy(desc(invitations.sentAt));
  return rows.map((r) => summary(r.inv, r.invitedByName));
}

export type InviteResult = { kind: "invited"; invitation: InvitationSummary } | { kind: "added"; member: { id: string; name: string; email: string } };

/**
 * Invites someone to a project's committee by e-mail. An existing committee member's account is
 * added to the project at once (and told so); an address of the firm's own people is refused. A
 * pending invitation to the same address is renewed rather than doubled.
 */
export async function inviteToCommittee({ user, projectId, email, name }: { user: SessionUser; projectId: string; email: string; name: string }): Promise<InviteResult> {
  const project = await loadProjectFor({ user, projectId });
  const [existing] = await db.select().from(users).where(eq(users.email, email)).limit(1);
  if (existing) {
    if (existing.role !== "client") {
      throw new AppError("invalid", `${email} belongs to ${existing.name}, one of the firm's people: add them as a project member instead.`, { email: ["This address belongs to one of the firm's people."] });
    }
    if (existing.disabled) throw new AppError("invalid", `The account of ${email} is disabled; an administrator can enable it.`, { email: ["This account is disabled."] });
    await db.insert(projectMembers).values({ projectId, userId: existing.id }).onConflictDoNothing();
    await sendAddedToProject({ project, email, name: existing.name, addedBy: user.name });
    return { kind: "added", member: { id: existing.id, name: existing.name, email } };
  }
  const { token, tokenHash } = newToken();
  const row = await db.transaction(async (tx) => {
    const [pending] = await tx
      .select()
      .from(invitations)
      .where(and(eq(invitations.projectId, projectId), eq(invitations.email, email), isNull(invitations.acceptedAt), isNull(invitations.withdrawnAt), gt(invitations.expiresAt, new Date())))
      .for("update")
      .limit(1);
    if (pending) {
      const [renewed] = await tx.update(invitations).set({ name, tokenHash, sentAt: new Date(), expiresAt: expiry(), invitedById: user.id }).where(eq(invitations.id, pending.id)).returning();
      return renewed!;
    }
    const [created] = await tx.insert(invitations).values({ projectId, email, name, tokenHash, invitedById: user.id, expiresAt: expiry() }).returning();
    return created!;
  });
  await sendInvitation({ project, email, name, token, invitedBy: user.name });
  return { kind: "invited", invitation: summary(row, user.name) };
}

async function loadInvitationFor({ user, invitationId }: { user: SessionUser; invitationId: string }): Promise<{ inv: Invitation; project: Project }> {
  if (!isUuid(invitationId)) throw new AppError("not_found", "No such invitation.");
  const [inv] = await db.select().from(invitations).where(eq(invitations.id, invitationId)).limit(1);
  if (!inv) throw new AppError("not_found", "No such invitation.");
  const project = await loadProjectFor({ user, projectId: inv.projectId });
  return { inv, project };
}

/** A new link (the old one stops working) and a fresh expiry, sent again. */
export async function resendInvitation({ user, invitationId }: { user: SessionUser; invitationId: string }): Promise<InvitationSummary> {
  const { inv, project } = await loadInvitationFor({ user, invitationId });
  if (inv.acceptedAt) throw new AppError("conflict", `${inv.name} has already accepted this invitation.`);
  const { token, tokenHash } = newToken();
  const [row] = await db.update(invitations).set({ tokenHash, sentAt: new Date(), expiresAt: expiry(), withdrawnAt: null, invitedById: user.id }).where(eq(invitations.id, inv.id)).returning();
  await sendInvitation({ project, email: inv.email, name: inv.name, token, invitedBy: user.name });
  return summary(row!, user.name);
}

export async function withdrawInvitation({ user, invitationId }: { user: SessionUser; invitationId: string }): Promise<InvitationSummary> {
  const { inv } = await loadInvitationFor({ user, invitationId });
  if (inv.acceptedAt) throw new AppError("conflict", `${inv.name} has already accepted this invitation; remove them from the committee instead.`);
  const [row] = await db.update(invitations).set({ withdrawnAt: new Date() }).where(eq(invitations.id, inv.id)).returning();
  return summary(row!, null);
}

/** Removes a committee member from one project (their account stays; their preference there goes). */
export async function removeCommitteeMember({ user, projectId, userId }: { user: SessionUser; projectId: string; userId: string }): Promise<void> {
  await loadProjectFor({ user, projectId });
  if (!isUuid(userId)) throw new AppError("not_found", "No such committee member.");
  const [member] = await db
    .select({ id: users.id })
    .from(projectMembers)
    .innerJoin(users, eq(users.id, projectMembers.userId))
    .where(and(eq(projectMembers.projectId, projectId), eq(projectMembers.userId, userId), eq(users.role, "client")))
    .limit(1);
  if (!member) throw new AppError("not_found", "No such committee member.");
  await db.transaction(async (tx) => {
    await tx.delete(schemePreferences).where(and(eq(schemePreferences.projectId, projectId), eq(schemePreferences.userId, userId)));
    await tx.delete(projectMembers).where(and(eq(projectMembers.projectId, projectId), eq(projectMembers.userId, userId)));
  });
}

/** What the invitation page shows for a link: who it is for and whether it still works. No session needed. */
export async function lookupInvitation({ token }: { token: string }): Promise<{ state: InvitationState | "unknown"; name?: string; email?: string; projectName?: string; expiresAt?: string }> {
  if (!token || token.length > 200) return { state: "unknown" };
  const [row] = await db
    .select({ inv: invitations, projectName: projects.name })
    .from(invitations)
    .innerJoin(projects, eq(projects.id, invitations.projectId))
    .where(eq(invitations.tokenHash, hashToken(token)))
    .limit(1);
  if (!row) return { state: "unknown" };
  const state = invitationState(row.inv);
  // Only a link that still works says whom it is for.
  if (state !== "pending") return { state, projectName: row.projectName };
  return { state, name: row.inv.name, email: row.inv.email, projectName: row.projectName, expiresAt: row.inv.expiresAt.toISOString() };
}

const stateMessages: Record<Exclude<InvitationState, "pending"> | "unknown", string> = {
  accepted: "This invitation has already been used. Sign in with the e-mail address and password chosen then.",
  expired: "This invitation has expired. Ask the organ builder to send you a new one.",
  withdrawn: "This invitation was withdrawn by the organ builder.",
  unknown: "This invitation link is not valid: it may have been replaced by a newer one. Use the latest e-mail, or ask the organ builder to send a new one.",
};
export function invitationProblem(state: InvitationState | "unknown"): string | null {
  return state === "pending" ? null : stateMessages[state];
}

/**
 * Accepts an invitation: makes the committee member's account and adds it to the project, in one
 * transaction that locks the invitation, so a link works exactly once.
 */
export async function acceptInvitation({ token, name, password }: { token: string; name: string; password: string }): Promise<{ email: string; projectId: string }> {
  const passwordHash = await hashPassword(password);
  return db.transaction(async (tx) => {
    const [inv] = await tx.select().from(invitations).where(eq(invitations.tokenHash, hashToken(token))).for("update").limit(1);
    const problem = invitationProblem(inv ? invitationState(inv) : "unknown");
    if (!inv || problem) throw new AppError(inv ? "conflict" : "not_found", problem!);
    const [taken] = await tx.select({ id: users.id }).from(users).where(eq(users.email, inv.email)).limit(1);
    if (taken) throw new AppError("conflict", `An account with ${inv.email} already exists. Sign in with it; the organ builder can add it to the project.`);
    const [created] = await tx.insert(users).values({ email: inv.email, name: name.trim(), role: "client", passwordHash }).returning({ id: users.id });
    await tx.insert(projectMembers).values({ projectId: inv.projectId, userId: created!.id });
    await tx.update(invitations).set({ acceptedAt: new Date(), acceptedUserId: created!.id }).where(eq(invitations.id, inv.id));
    return { email: inv.email, projectId: inv.projectId };
  });
}
