import { addProjectMember } from "@/db/queries/projects";
import { route } from "@/lib/server/guard";
import { memberSchema } from "@/lib/spec/projects";

export const POST = route<typeof memberSchema, { projectId: string }>({ permission: "projects:edit", body: memberSchema }, async ({ user, params, body }) => {
  const { project } = await addProjectMember({ user, projectId: params.projectId, email: body.email });
  return { project };
});
