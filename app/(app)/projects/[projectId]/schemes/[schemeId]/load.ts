import "server-only";
import { notFound } from "next/navigation";
import { cache } from "react";
import { loadProjectFor } from "@/db/queries/access";
import { getSchemeForUser } from "@/db/queries/schemes";
import { AppError } from "@/lib/server/errors";
import type { SessionUser } from "@/lib/server/guard";

/**
 * The scheme and its project for a page, or the 404 page (also when the scheme is not this project's).
 * Once per request (React's cache): the editor's layout checks it before its skeleton streams, and
 * the page then reads the same result.
 */
export const loadSchemePage = cache(async function loadSchemePage(user: SessionUser, projectId: string, schemeId: string) {
  try {
    const scheme = await getSchemeForUser({ user, schemeId });
    if (scheme.projectId !== projectId) notFound();
    // The project row only: the page needs its name and venue, not its scheme list and members.
    const project = await loadProjectFor({ user, projectId });
    return { scheme, project };
  } catch (err) {
    if (err instanceof AppError && (err.code === "not_found" || err.code === "forbidden")) notFound();
    throw err;
  }
});
