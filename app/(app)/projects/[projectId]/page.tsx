import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { getProjectForUser } from "@/db/queries/projects";
import { can } from "@/lib/roles";
import { AppError } from "@/lib/server/errors";
import { requirePageUser } from "@/lib/server/guard";
import { projectStatusLabels } from "@/lib/spec/projects";
import { ArchiveButton } from "./archive-button";
import { MembersPanel } from "./members-panel";
import { ProjectDetailsForm } from "./project-details-form";
import { ProjectLinks } from "./project-links";
import { SchemesList } from "./schemes-list";

export const metadata: Metadata = { title: "Project" };

export default async function ProjectPage({ params }: { params: Promise<{ projectId: string }> }) {
  const { projectId } = await params;
  const user = await requirePageUser("projects:read", `/projects/${projectId}`);
  let data;
  try {
    data = await getProjectForUser({ user, projectId });
  } catch (err) {
    if (err instanceof AppError && (err.code === "not_found" || err.code === "forbidden")) notFound();
    throw err;
  }
  const { project, schemes } = data;
  const mayEdit = can(user.role, "projects:edit");
  return (
    <div className="space-y-6">
      <div className="flex flex-wrap items-end gap-4">
        <div className="min-w-0 flex-1">
          <nav aria-label="Breadcrumb" className="text-xs text-tin">
            <Link href="/projects" className="hover:text-ink">Projects</Link> <span aria-hidden="true">/</span>
          </nav>
          <h1 className="text-3xl font-semibold" data-testid="project-name">{project.name}</h1>
          <p className="text-ink-soft">
            {project.clientName}
            {project.venue && <> · {project.venue}</>}
            {project.location && <> · {project.location}</>}
            {" · "}
            <span data-testid="project-status">{projectStatusLabels[project.status]}</span>
            {project.archived && <span className="ml-2 rounded border border-tin-rule px-1 text-xs text-tin">▣ Archived</span>}
          </p>
        </div>
        {mayEdit && <ArchiveButton projectId={project.id} archived={project.archived} />}
      </div>
      <ProjectLinks projectId={project.id} role={user.role} />
      <div className="grid gap-6 xl:grid-cols-[1fr_26rem]">
        <div className="min-w-0 space-y-6">
          <SchemesList projectId={project.id} schemes={schemes} mayEdit={can(user.role, "schemes:edit")} />
          <section className="panel p-4">
            <h2 className="mb-3 text-xl font-semibold">Details</h2>
            <ProjectDetailsForm project={project} readOnly={!mayEdit} />
          </section>
        </div>
        <MembersPanel projectId={project.id} members={project.members} mayEdit={mayEdit} selfId={user.id} />
      </div>
    </div>
  );
}
