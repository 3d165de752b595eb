import type { Metadata } from "next";
import { CommitteeScheme, type HeadlineFigures } from "@/components/committee/committee-scheme";
import { SchemeDiscussion } from "@/components/committee/discussion";
import { SchemeEditor } from "@/components/spec/scheme-editor";
import { listComments, listNotes } from "@/db/queries/comments";
import { sentTenderOfScheme } from "@/db/queries/quotations";
import { keys } from "@/lib/query/keys";
import { Hydrate, prefetch } from "@/lib/query/server";
import { can } from "@/lib/roles";
import { requirePageUser, type SessionUser } from "@/lib/server/guard";
import { figureSourceFor, firmRates } from "@/lib/server/rates";
import type { SchemeRead } from "@/lib/spec/document";
import { estimateDocument } from "@/lib/spec/estimate";
import { loadSchemePage } from "../load";

export const metadata: Metadata = { title: "Scheme" };

/** Worked out here so the committee's browser receives the numbers alone. */
async function headlineFigures(scheme: SchemeRead): Promise<HeadlineFigures | null> {
  const r = estimateDocument(scheme.document, scheme.tuning, await firmRates());
  if (!r.ok) return null;
  const t = r.estimate.totals;
  return {
    tender: await sentTenderOfScheme({ schemeId: scheme.id }),
    stops: t.stops,
    ranks: t.ranks,
    pipes: { total: t.pipes.total, new: t.pipes.new, reused: t.pipes.reused, restored: t.pipes.restored },
    weeks: r.estimate.programme.totalWeeks,
    chests: r.estimate.divisions.filter((d) => d.chest.main.rows > 0).map((d) => ({ name: d.name, fits: d.chest.fit?.fits ?? null })),
  };
}

async function prefetchDiscussion(user: SessionUser, scheme: SchemeRead) {
  await Promise.all([
    prefetch(keys.schemes.detail(scheme.id), async () => scheme),
    prefetch(keys.schemes.comments(scheme.id), () => listComments({ user, schemeId: scheme.id })),
    can(user.role, "notes:read") && prefetch(keys.schemes.notes(scheme.id), () => listNotes({ user, schemeId: scheme.id })),
  ]);
}

export default async function SchemePage({ params }: { params: Promise<{ projectId: string; schemeId: string }> }) {
  const { projectId, schemeId } = await params;
  const user = await requirePageUser("schemes:read", `/projects/${projectId}/schemes/${schemeId}`);
  const { scheme, project } = await loadSchemePage(user, projectId, schemeId);
  await prefetchDiscussion(user, scheme);
  const discussion = <SchemeDiscussion schemeId={scheme.id} selfId={user.id} canComment={can(user.role, "comments:write")} canNotes={can(user.role, "notes:read")} />;
  if (user.role === "client") {
    return (
      <Hydrate>
        <div className="space-y-4">
          <CommitteeScheme scheme={scheme} projectName={project.name} clientName={project.clientName} figures={await headlineFigures(scheme)} />
          {discussion}
        </div>
      </Hydrate>
    );
  }
  return (
    <Hydrate>
      <div className="space-y-6">
        <SchemeEditor
          key={scheme.id}
          initialScheme={scheme}
          projectId={project.id}
          projectName={project.name}
          editable={can(user.role, "schemes:edit")}
          showMoney={can(user.role, "money:read")}
          showFigures={can(user.role, "estimate:read")}
          canSeeRevisions={can(user.role, "revisions:read")}
          figureSource={await figureSourceFor(user, scheme)}
        />
        {discussion}
      </div>
    </Hydrate>
  );
}
