import { addProjectMember } from "@/db/queries/projects";
import { route } from "@/lib/server/guard";
import { projectParams } from "@/lib/server/params";
import { memberSchema } from "@/lib/spec/projects";

export const POST = route({ permission: "projects:edit", params: projectParams, body: memberSchema }, async ({ user, params, body }) => {
  const { project } = await addProjectMember({ user, projectId: params.projectId, email: body.email });
  return { project };
});
