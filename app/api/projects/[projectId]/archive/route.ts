import { setProjectArchived } from "@/db/queries/projects";
import { route } from "@/lib/server/guard";
import { archiveSchema } from "@/lib/spec/projects";

export const POST = route<typeof archiveSchema, { projectId: string }>({ permission: "projects:edit", body: archiveSchema }, async ({ user, params, body }) => {
  const { project } = await setProjectArchived({ user, projectId: params.projectId, archived: body.archived });
  return { project };
});
