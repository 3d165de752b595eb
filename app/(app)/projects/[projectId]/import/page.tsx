import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { ImportPanel } from "@/components/stop-lists/import-panel";
import { getProjectForUser } from "@/db/queries/projects";
import { AppError } from "@/lib/server/errors";
import { requirePageUser } from "@/lib/server/guard";
import { stopListColumns } from "@/lib/spec/stop-list-csv";

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
          A spreadsheet saved as CSV, one row per stop, or a Stopwright scheme file (.json). You see what will be created, or every
          problem by row, before anything is saved.
        </p>
        <details className="mt-2 text-sm">
          <summary className="cursor-pointer text-ink-soft underline decoration-tin-rule underline-offset-2">Which columns does a CSV stop list have?</summary>
          <p className="mt-2 text-ink-soft">
            A heading row, then one row per stop. <strong>division</strong>, <strong>name</strong>, <strong>pitch</strong> (8′, 16&apos;, 2⅔, 2 2/3 …)
            and <strong>family</strong> are needed; every other column may be left out or empty and takes its usual value. A stop list
            downloaded from Stopwright has them all:
          </p>
          <p className="mt-1 font-mono text-xs text-ink-soft">{stopListColumns().map((c) => c.header).join(", ")}</p>
        </details>
      </div>
      {project.archived ? (
        <p className="panel p-4 text-sm">This project is archived; bring it back from the archive to import into it.</p>
      ) : (
        <ImportPanel projectId={project.id} drafts={drafts} />
      )}
    </div>
  );
}
