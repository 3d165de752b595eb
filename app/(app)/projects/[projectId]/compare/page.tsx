import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { CompareView } from "@/components/compare/compare-view";
import { getComparisonForUser } from "@/db/queries/comparison";
import { getProjectForUser } from "@/db/queries/projects";
import { keys } from "@/lib/query/keys";
import { Hydrate, prefetch } from "@/lib/query/server";
import { AppError } from "@/lib/server/errors";
import { requirePageUser } from "@/lib/server/guard";
import { MAX_COMPARED, MIN_COMPARED } from "@/lib/spec/comparison";

export const metadata: Metadata = { title: "Compare schemes" };

export default async function ComparePage({ params, searchParams }: { params: Promise<{ projectId: string }>; searchParams: Promise<{ schemes?: string }> }) {
  const { projectId } = await params;
  const { schemes: asked } = await searchParams;
  const user = await requirePageUser("schemes:read", `/projects/${projectId}/compare`);
  const { project, schemes } = await orNotFound(prefetch(keys.projects.detail(projectId), () => getProjectForUser({ user, projectId })));
  const known = new Set(schemes.map((s) => s.id));
    // Schemes named in the address that this reader may see, in that order; else the first two.
  let chosen = [...new Set((asked ?? "").split(",").filter((id) => known.has(id)))].slice(0, MAX_COMPARED);
  if (chosen.length < MIN_COMPARED) chosen = schemes.slice(0, MIN_COMPARED).map((s) => s.id);
  if (chosen.length >= MIN_COMPARED) await orNotFound(prefetch(keys.projects.comparison(projectId, chosen), () => getComparisonForUser({ user, projectId, schemeIds: chosen })));
  return (
      <div className="space-y-4">
        <div>
          <nav aria-label="Breadcrumb" className="text-xs text-tin print:hidden">
            <Link href="/projects" className="hover:text-ink">Projects</Link> <span aria-hidden="true">/</span>{" "}
            <Link href={`/projects/${projectId}`} className="hover:text-ink">{project.name}</Link> <span aria-hidden="true">/</span>
          </nav>
          <h1 className="text-3xl font-semibold">Schemes side by side</h1>
          <p className="text-ink-soft">{project.name} · {project.clientName}</p>
        </div>
        {schemes.length < MIN_COMPARED ? (
          <p className="panel px-4 py-3 text-sm text-ink-soft">There is only {schemes.length === 1 ? "one scheme" : "no scheme"} to look at here; a comparison needs two.</p>
        ) : (
          <Hydrate>
            <CompareView projectId={projectId} options={schemes.map((s) => ({ id: s.id, name: s.name }))} chosen={chosen} />
          </Hydrate>
        )}
      </div>
  );
}

async function orNotFound<T>(p: Promise<T>): Promise<T> {
  try {
    return await p;
  } catch (err) {
    if (err instanceof AppError && (err.code === "not_found" || err.code === "forbidden")) notFound();
    throw err;
  }
}
