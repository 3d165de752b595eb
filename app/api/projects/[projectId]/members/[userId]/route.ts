import { removeProjectMember } from "@/db/queries/projects";
import { route } from "@/lib/server/guard";
import { memberParams } from "@/lib/server/params";

export const DELETE = route({ permission: "projects:edit", params: memberParams }, async ({ user, params }) => {
  const { project } = await removeProjectMember({ user, projectId: params.projectId, userId: params.userId });
  return { project };
});
