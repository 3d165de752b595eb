"use client";
import Link from "next/link";
import { useProject } from "@/lib/query/hooks";
import type { Role } from "@/lib/roles";
import { projectStatusLabels } from "@/lib/spec/projects";
import { ArchiveButton } from "./archive-button";
import { CommitteePanel } from "./committee-panel";
import { MembersPanel } from "./members-panel";
import { PreferenceSummaryPanel } from "./preferences";
import { ProjectDetailsForm } from "./project-details-form";
import { ProjectDetailsText } from "./project-details-text";
import { ProjectLinks } from "./project-links";
import { SchemesList } from "./schemes-list";

export type ProjectAbilities = {
  selfId: string;
  role: Role;
  isClient: boolean;
  editProject: boolean;
  /** Set the project's status without editing its other details (the estimator). */
  setStatus: boolean;
  editSchemes: boolean;
  manageCommittee: boolean;
  readPreferences: boolean;
};

/** A project's page for the firm (a committee member has CommitteeProjectView), from the project read the server prefetched (and that mutations refresh). */
export function ProjectView({ projectId, can }: { projectId: string; can: ProjectAbilities }) {
  const { data } = useProject(projectId);
  if (!data) return null;
  const { project, schemes } = data;
  const firm = project.members.filter((m) => m.role !== "client");
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
        {can.editProject && <ArchiveButton projectId={project.id} projectName={project.name} archived={project.archived} />}
      </div>
      <ProjectLinks projectId={project.id} role={can.role} />
      <div className="grid grid-cols-1 gap-6 xl:grid-cols-[1fr_26rem]">
        <div className="min-w-0 space-y-6">
          <SchemesList projectId={project.id} schemes={schemes} mayEdit={can.editSchemes} clientView={false} />
          {can.readPreferences && <PreferenceSummaryPanel projectId={project.id} />}
          <section className="panel p-4">
            <h2 className="mb-3 text-xl font-semibold">Details</h2>
            {can.editProject ? <ProjectDetailsForm project={project} readOnly={false} /> : <ProjectDetailsText project={project} mayChangeStatus={can.setStatus && !project.archived} />}
          </section>
        </div>
        <div className="min-w-0 space-y-6">
          {can.manageCommittee && <CommitteePanel projectId={project.id} members={project.members} />}
          <MembersPanel projectId={project.id} members={firm} mayEdit={can.editProject} selfId={can.selfId} />
        </div>
      </div>
    </div>
  );
}
