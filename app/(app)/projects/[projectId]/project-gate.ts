import "server-only";
import { notFound } from "next/navigation";
import { loadProjectFor } from "@/db/queries/access";
import type { Permission } from "@/lib/roles";
import { AppError } from "@/lib/server/errors";
import { requirePageUser } from "@/lib/server/guard";

/**
 * The checks of a project's page, made in a layout above its loading skeleton: once the skeleton has
 * streamed, the status is sent, so a project the user may not see must be refused before it, as a
 * 404 worded as for an id that does not exist. The page checks again as it reads.
 */
export async function gateProjectPage({ projectId, permission, path }: { projectId: string; permission: Permission; path: string }): Promise<void> {
  const user = await requirePageUser(permission, path);
  try {
    await loadProjectFor({ user, projectId });
  } catch (err) {
    if (err instanceof AppError && (err.code === "not_found" || err.code === "forbidden")) notFound();
    throw err;
  }
}
