import { setProjectArchived } from "@/db/queries/projects";
import { route } from "@/lib/server/guard";
import { projectParams } from "@/lib/server/params";
import { archiveSchema } from "@/lib/spec/projects";

export const POST = route({ permission: "projects:edit", params: projectParams, body: archiveSchema }, async ({ user, params, body }) => {
  const { project } = await setProjectArchived({ user, projectId: params.projectId, archived: body.archived });
  return { project };
});
