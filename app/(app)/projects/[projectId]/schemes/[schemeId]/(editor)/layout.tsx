import type { ReactNode } from "react";
import { requirePageUser } from "@/lib/server/guard";
import { loadSchemePage } from "../load";

/**
 * Who asks and whether the scheme is theirs to see, settled before the editor's skeleton
 * (loading.tsx) streams: a scheme that does not exist answers 404, not a 200 page that later says
 * "not found". The page reads the same scheme from the request's cache.
 */
export default async function SchemeEditorLayout({ children, params }: { children: ReactNode; params: Promise<{ projectId: string; schemeId: string }> }) {
  const { projectId, schemeId } = await params;
  const user = await requirePageUser("schemes:read", `/projects/${projectId}/schemes/${schemeId}`);
  await loadSchemePage(user, projectId, schemeId);
  return children;
}
