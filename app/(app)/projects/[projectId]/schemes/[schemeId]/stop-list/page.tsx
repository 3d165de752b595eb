import type { Metadata } from "next";
import Link from "next/link";
import { StopList } from "@/components/spec/stop-list";
import { formatDate } from "@/components/spec/format";
import { requirePageUser } from "@/lib/server/guard";
import { loadSchemePage } from "../load";
import { PrintButton } from "./print-button";

export const metadata: Metadata = { title: "Stop list" };

export default async function StopListPage({ params }: { params: Promise<{ projectId: string; schemeId: string }> }) {
  const { projectId, schemeId } = await params;
  const user = await requirePageUser("schemes:read", `/projects/${projectId}/schemes/${schemeId}/stop-list`);
  const { scheme, project } = await loadSchemePage(user, projectId, schemeId);
  const doc = scheme.document;
  return (
    <article className="mx-auto max-w-5xl bg-paper-card px-8 py-8 shadow-sm print:max-w-none print:bg-white print:p-0 print:shadow-none">
      <div className="mb-4 flex flex-wrap items-center gap-3 print:hidden">
        <Link href={`/projects/${projectId}/schemes/${schemeId}`} className="btn">← Back to the editor</Link>
        <PrintButton />
        <a className="btn" href={`/api/schemes/${schemeId}/export?format=csv`} download>Download CSV</a>
        <a className="btn" href={`/api/schemes/${schemeId}/export`} download>Download scheme file (JSON)</a>
      </div>
      <header className="mb-6 border-b border-ink pb-3 text-center font-serif">
        <p className="text-sm uppercase tracking-[0.2em] text-ink-soft">{project.clientName}{project.venue && ` · ${project.venue}`}</p>
        <h1 className="mt-1 text-3xl font-semibold">{doc.name}</h1>
        {doc.description && <p className="mx-auto mt-1 max-w-2xl text-sm italic text-ink-soft">{doc.description}</p>}
        <p className="mt-1 text-xs text-tin">
          {project.name} · version {scheme.version} · {formatDate(scheme.updatedAt)} · pitch a′ = {project.pitchHz} Hz
        </p>
      </header>
      <StopList doc={doc} />
    </article>
  );
}
