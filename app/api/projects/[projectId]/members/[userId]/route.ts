import { removeProjectMember } from "@/db/queries/projects";
import { isUuid } from "@/db/queries/access";
import { AppError } from "@/lib/server/errors";
import { route } from "@/lib/server/guard";

export const DELETE = route<undefined, { projectId: string; userId: string }>({ permission: "projects:edit" }, async ({ user, params }) => {
  if (!isUuid(params.userId)) throw new AppError("not_found", "No such member.");
  const { project } = await removeProjectMember({ user, projectId: params.projectId, userId: params.userId });
  return { project };
});
