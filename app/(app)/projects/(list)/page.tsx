import type { Metadata } from "next";
import { listProjectsForUser } from "@/db/queries/projects";
import { keys } from "@/lib/query/keys";
import { Hydrate, prefetch } from "@/lib/query/server";
import { can } from "@/lib/roles";
import { requirePageUser } from "@/lib/server/guard";
import { NewProjectForm } from "../new-project-form";
import { ProjectsTable } from "../projects-table";

export const metadata: Metadata = { title: "Projects" };

export default async function ProjectsPage() {
  const user = await requirePageUser("projects:read", "/projects");
  await prefetch(keys.projects.list(false), () => listProjectsForUser({ user, includeArchived: false }));
  const mayCreate = can(user.role, "projects:create");
  return (
    <div className={mayCreate ? "grid gap-6 xl:grid-cols-[1fr_24rem]" : ""}>
      <section className="panel min-w-0">
        <div className="border-b border-tin-rule px-4 py-3">
          <h1 className="text-2xl font-semibold">Projects</h1>
          <p className="text-sm text-ink-soft">Each project is one instrument job for one client, with its alternative schemes.</p>
        </div>
        <Hydrate>
          <ProjectsTable />
        </Hydrate>
      </section>
      {mayCreate && (
        <section className="panel self-start p-4">
          <h2 className="mb-3 text-xl font-semibold">New project</h2>
          <NewProjectForm />
        </section>
      )}
    </div>
  );
}
