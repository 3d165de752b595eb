import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { ImportPanel } from "@/components/stop-lists/import-panel";
import { getProjectForUser } from "@/db/queries/projects";
import { AppError } from "@/lib/server/errors";
import { requirePageUser } from "@/lib/server/guard";

export const metadata: Metadata = { title: "Import a stop list" };

export default async function ImportPage({ params }: { params: Promise<{ projectId: string }> }) {
  const { projectId } = await params;
  const user = await requirePageUser("schemes:edit", `/projects/${projectId}/import`);
  let data;
  try {
    data = await getProjectForUser({ user, projectId });
  } catch (err) {
    if (err instanceof AppError && err.code === "not_found") notFound();
    throw err;
  }
  const { project, schemes } = data;
  const drafts = schemes.filter((s) => s.status === "draft").map((s) => ({ id: s.id, name: s.name, version: s.version }));
  return (
    <div className="mx-auto max-w-5xl space-y-6">
      <div>
        <nav aria-label="Breadcrumb" className="text-xs text-tin">
          <Link href="/projects" className="hover:text-ink">Projects</Link> <span aria-hidden="true">/</span>{" "}
          <Link href={`/projects/${project.id}`} className="hover:text-ink">{project.name}</Link> <span aria-hidden="true">/</span>
        </nav>
        <h1 className="text-3xl font-semibold">Import a stop list</h1>
        <p className="text-ink-soft">
          A spreadsheet saved as CSV, one row per stop (columns in <em>docs/stop-list-csv.md</em>), or a Stopwright scheme file (.json).
          You see what will be created, or every problem by row, before anything is saved.
        </p>
      </div>
      {project.archived ? (
        <p className="panel p-4 text-sm">This project is archived; bring it back from the archive to import into it.</p>
      ) : (
        <ImportPanel projectId={project.id} drafts={drafts} />
      )}
    </div>
  );
}
