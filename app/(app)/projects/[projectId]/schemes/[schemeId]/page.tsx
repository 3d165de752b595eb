import type { Metadata } from "next";
import { SchemeEditor } from "@/components/spec/scheme-editor";
import { can } from "@/lib/roles";
import { requirePageUser } from "@/lib/server/guard";
import { ratesForUser } from "@/lib/server/rates";
import { loadSchemePage } from "./load";

export const metadata: Metadata = { title: "Scheme" };

export default async function SchemePage({ params }: { params: Promise<{ projectId: string; schemeId: string }> }) {
  const { projectId, schemeId } = await params;
  const user = await requirePageUser("schemes:read", `/projects/${projectId}/schemes/${schemeId}`);
  const { scheme, project } = await loadSchemePage(user, projectId, schemeId);
  return (
    <SchemeEditor
      key={scheme.id}
      initialScheme={scheme}
      projectId={project.id}
      projectName={project.name}
      editable={can(user.role, "schemes:edit")}
      showMoney={can(user.role, "money:read")}
      showFigures={can(user.role, "estimate:read")}
      canSeeRevisions={can(user.role, "revisions:read")}
      rates={ratesForUser(user)}
    />
  );
}
