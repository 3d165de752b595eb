import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { listInvitations } from "@/db/queries/committee";
import { getOwnPreference, summarisePreferences } from "@/db/queries/preferences";
import { getProjectForUser } from "@/db/queries/projects";
import { keys } from "@/lib/query/keys";
import { Hydrate, prefetch } from "@/lib/query/server";
import { can } from "@/lib/roles";
import { AppError } from "@/lib/server/errors";
import { requirePageUser } from "@/lib/server/guard";
import { ProjectView } from "./project-view";

export const metadata: Metadata = { title: "Project" };

export default async function ProjectPage({ params }: { params: Promise<{ projectId: string }> }) {
  const { projectId } = await params;
  const user = await requirePageUser("projects:read", `/projects/${projectId}`);
  const abilities = {
    selfId: user.id,
    role: user.role,
    isClient: user.role === "client",
    editProject: can(user.role, "projects:edit"),
    editSchemes: can(user.role, "schemes:edit"),
    manageCommittee: can(user.role, "committee:manage"),
    readPreferences: can(user.role, "preferences:read"),
  };
  try {
    await prefetch(keys.projects.detail(projectId), () => getProjectForUser({ user, projectId }));
  } catch (err) {
    if (err instanceof AppError && (err.code === "not_found" || err.code === "forbidden")) notFound();
    throw err;
  }
  await Promise.all([
    abilities.manageCommittee && prefetch(keys.projects.invitations(projectId), () => listInvitations({ user, projectId })),
    abilities.readPreferences && prefetch(keys.projects.preferences(projectId), () => summarisePreferences({ user, projectId })),
    abilities.isClient && prefetch(keys.projects.ownPreference(projectId), () => getOwnPreference({ user, projectId })),
  ]);
  return (
    <Hydrate>
      <ProjectView projectId={projectId} can={abilities} />
    </Hydrate>
  );
}
