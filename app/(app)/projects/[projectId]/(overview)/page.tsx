import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { listInvitations } from "@/db/queries/committee";
import { getOwnPreference, summarisePreferences } from "@/db/queries/preferences";
import { getProjectForUser } from "@/db/queries/projects";
import { listQuotationsForProject } from "@/db/queries/quotations";
import { listRateSets } from "@/db/queries/rate-sets";
import { keys } from "@/lib/query/keys";
import { Hydrate, prefetch } from "@/lib/query/server";
import { mayReadQuotation } from "@/lib/quote/access";
import { can } from "@/lib/roles";
import { AppError } from "@/lib/server/errors";
import { requirePageUser } from "@/lib/server/guard";
import { getFirm } from "@/db/queries/firm";
import { CommitteeProjectView } from "../committee-project-view";
import { ProjectView } from "../project-view";
import { QuotationsPanel } from "../quotations-panel";

export const metadata: Metadata = { title: "Project" };

export default async function ProjectPage({ params }: { params: Promise<{ projectId: string }> }) {
  const { projectId } = await params;
  const user = await requirePageUser("projects:read", `/projects/${projectId}`);
  const abilities = {
    selfId: user.id,
    role: user.role,
    isClient: user.role === "client",
    editProject: can(user.role, "projects:edit"),
    setStatus: can(user.role, "projects:status"),
    editSchemes: can(user.role, "schemes:edit"),
    manageCommittee: can(user.role, "committee:manage"),
    readPreferences: can(user.role, "preferences:read"),
  };
  let data;
  try {
    data = await prefetch(keys.projects.detail(projectId), () => getProjectForUser({ user, projectId }));
  } catch (err) {
    if (err instanceof AppError && (err.code === "not_found" || err.code === "forbidden")) notFound();
    throw err;
  }
  const mayIssue = can(user.role, "quotes:issue");
  const [quotations, rateSets] = await Promise.all([
    listQuotationsForProject({ user, projectId }),
    mayIssue ? listRateSets() : Promise.resolve([]),
    abilities.manageCommittee && prefetch(keys.projects.invitations(projectId), () => listInvitations({ user, projectId })),
    abilities.readPreferences && prefetch(keys.projects.preferences(projectId), () => summarisePreferences({ user, projectId })),
    abilities.isClient && prefetch(keys.projects.ownPreference(projectId), () => getOwnPreference({ user, projectId })),
  ]);
  const quotationsPanel = (
    <QuotationsPanel
      projectId={projectId}
      initial={quotations}
      schemes={data.schemes.map((s) => ({ id: s.id, name: s.name }))}
      rateSets={rateSets.map((r) => ({ id: r.id, name: r.name, isCurrent: r.isCurrent }))}
      mayIssue={mayIssue && !data.project.archived}
      mayRead={mayReadQuotation(user.role)}
      role={user.role}
    />
  );
  if (abilities.isClient) {
    // The firm's public contact details, as on a tender's cover; nothing else of the firm's row.
    const firm = await getFirm();
    return (
      <Hydrate>
        <CommitteeProjectView projectId={projectId} selfId={user.id} firm={{ name: firm.name, email: firm.email, phone: firm.phone, website: firm.website }} tenders={quotations}>
          {quotationsPanel}
        </CommitteeProjectView>
      </Hydrate>
    );
  }
  return (
    <Hydrate>
      <div className="space-y-6">
        <ProjectView projectId={projectId} can={abilities} />
        {quotationsPanel}
      </div>
    </Hydrate>
  );
}
