import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { Caution } from "@/components/ui/caution";
import { FilesBrowser } from "@/components/files/files-browser";
import { encodeLink } from "@/components/files/link-select";
import { listLinkTargets } from "@/db/queries/files";
import { getProjectForUser } from "@/db/queries/projects";
import { can } from "@/lib/roles";
import { AppError } from "@/lib/server/errors";
import { requirePageUser } from "@/lib/server/guard";

export const metadata: Metadata = { title: "Survey files" };

export default async function ProjectFilesPage({ params, searchParams }: { params: Promise<{ projectId: string }>; searchParams: Promise<{ scheme?: string; stop?: string; division?: string }> }) {
  const { projectId } = await params;
  const query = await searchParams;
  const user = await requirePageUser("files:read", `/projects/${projectId}/files`);
  let data;
  try {
    data = await Promise.all([getProjectForUser({ user, projectId }), listLinkTargets({ user, projectId })]);
  } catch (err) {
    if (err instanceof AppError && err.code === "not_found") notFound();
    throw err;
  }
  const [{ project }, targets] = data;
  // "Add a file for this stop" from the editor arrives with the stop already chosen.
  const initialLink = query.scheme && (query.stop || query.division) ? encodeLink({ schemeId: query.scheme, stopId: query.stop, divisionId: query.stop ? undefined : query.division }) : "";
  return (
    <div className="space-y-6">
      <div>
        <nav aria-label="Breadcrumb" className="text-xs text-tin">
          <Link href="/projects" className="hover:text-ink">Projects</Link> <span aria-hidden="true">/</span>{" "}
          <Link href={`/projects/${project.id}`} className="hover:text-ink">{project.name}</Link> <span aria-hidden="true">/</span>
        </nav>
        <h1 className="text-3xl font-semibold">Survey files</h1>
        <p className="text-ink-soft">
          {user.role === "client"
            ? "Photos, drawings and documents the firm has shared with the committee."
            : "Photos of the instrument as found, drawings and documents; link each to the division or stop it shows, and share with the committee what they should see."}
        </p>
        {user.role !== "client" && (
          <Caution className="mt-2 max-w-3xl">
            Surveying inside an organ case means ladders and heights, and handling lead-bearing pipe metal: work to the site&apos;s risk
            assessment and local regulations for access at height and for lead, and leave mains electrics to a licensed electrician.
          </Caution>
        )}
      </div>
      <FilesBrowser projectId={project.id} targets={targets} mayWrite={can(user.role, "files:write") && !project.archived} mayShare={can(user.role, "files:share")} initialLink={initialLink} committeeView={user.role === "client"} />
    </div>
  );
}
